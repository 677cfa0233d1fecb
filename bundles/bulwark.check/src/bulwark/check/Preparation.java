package bulwark.check;

/** How preparing a design ended: ready for solving, or stopped with the result that says why. */
public sealed interface Preparation permits Preparation.Ready, Preparation.Stopped {
	/** The design passed every shared stage. */
	record Ready(PreparedDesign design) implements Preparation {
	}

	/** The design cannot be solved; the result (status error) holds the findings that say why. */
	record Stopped(DesignResult result) implements Preparation {
	}
}
