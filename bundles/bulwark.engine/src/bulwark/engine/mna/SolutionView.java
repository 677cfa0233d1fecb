package bulwark.engine.mna;

/** A solved point, as a device reads it to report its own pin currents. */
public interface SolutionView {
	double voltage(int net);

	/** This device's k-th branch current. */
	double branchCurrent(int k);

	/** Time of the point, s (0 for an operating point). */
	double time();

	/** The step that led to this point, or null for an operating point. */
	TransientStep transientStep();

	/** The device's values at the previous accepted point (see {@link Stamp#history()}). */
	double[] history();
}
