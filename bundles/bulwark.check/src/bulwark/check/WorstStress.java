package bulwark.check;

/**
 * One stress of one part at its worst over every solved case: the value, the case, and — when the part has
 * the rating — the rating, the policy's derating factor and the utilisation of the derated limit.
 */
public record WorstStress(String part, String rating, String what, String unit, double value, String caseName,
		Double rated, Double factor, Double utilisation) {
	public Double limit() {
		return rated == null ? null : rated * factor;
	}
}
