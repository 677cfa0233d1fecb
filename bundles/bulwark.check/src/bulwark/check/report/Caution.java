package bulwark.check.report;

/**
 * The caution every output of Bulwark carries — reports, the command line, the workbench — written once so
 * that no output drops it or words it differently.
 */
public final class Caution {
	public static final String TEXT = "Caution: mains and surge energy can kill. Bulwark checks a model, not a "
			+ "built board. Follow IEC 61010-1 and local codes; sign-off belongs to a competent, licensed person.";

	/**
	 * Its first two sentences, for a space too narrow for the whole (the workbench's status line, where the
	 * whole is the tooltip): clipped, the whole would lose its middle.
	 */
	public static final String SHORT = TEXT.substring(0, TEXT.indexOf(" Follow"));

	private Caution() {
	}
}
