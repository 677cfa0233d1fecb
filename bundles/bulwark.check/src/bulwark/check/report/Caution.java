package bulwark.check.report;

/**
 * The caution every output of Bulwark carries — reports, the command line, the workbench — written once so
 * that no output drops it or words it differently.
 */
public final class Caution {
	public static final String TEXT = "Caution: mains and surge energy can kill. Bulwark checks a model, not a "
			+ "built board. Follow IEC 61010-1 and local codes; sign-off belongs to a competent, licensed person.";

	private Caution() {
	}
}
