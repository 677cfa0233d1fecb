package bulwark.check.cases;

/**
 * One part's figures in one case. {@code utilisation} is the largest stress over its rating (null when the
 * part has no rating to compare with) and {@code limiting} names which stress that was ("power", "voltage").
 */
public record PartStress(String part, double voltage, double current, double power, Double utilisation,
		String limiting) {
}
