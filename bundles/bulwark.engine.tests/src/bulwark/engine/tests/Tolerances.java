package bulwark.engine.tests;

/** Named tolerances of the engine tests. */
final class Tolerances {
	/** Relative agreement expected of a linear solve of a well-conditioned network (double precision). */
	static final double LINEAR_RELATIVE = 1e-12;

	private Tolerances() {
	}

	static double rel(double expected) {
		return Math.abs(expected) * LINEAR_RELATIVE + 1e-15;
	}
}
