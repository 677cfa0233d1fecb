package bulwark.check.cases;


/** What a case is, which decides how it is solved and which figures it judges. */
public enum CaseKind {
	/** The design as it works: terminals open, or one shorted to the common terminal. */
	NORMAL("normal"),
	/** A case the design writes. */
	DESIGNER("designer"),
	/** A designer's case with a sine among its actions, solved over its cycle as mains is. */
	DESIGNER_SINE("designer sine"),
	/** A DC level or a reversed battery from the review policy. */
	ABUSE("abuse"),
	/** A combination-wave surge, solved as a transient; its figures are taken at the instants of peak stress. */
	SURGE("surge"),
	/**
	 * Mains across a pair of terminals as the sine it is, solved over its cycle; its figures are taken at the
	 * instants of peak stress, power as the average over the cycle (see MainsRunner).
	 */
	MAINS("mains");

	private final String id;

	CaseKind(String id) {
		this.id = id;
	}

	/** The name reports give the kind ("normal", "mains"…); part of the JSON contract. */
	public String id() {
		return id;
	}

	/** Abuse at the terminals: a generated DC case, mains, a reversed battery or a surge. */
	public boolean isAbuse() {
		return this == ABUSE || this == SURGE || this == MAINS;
	}

	/** Solved over a sine's cycle. */
	public boolean overACycle() {
		return this == MAINS || this == DESIGNER_SINE;
	}
}
