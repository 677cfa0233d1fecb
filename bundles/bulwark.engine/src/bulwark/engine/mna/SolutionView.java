package bulwark.engine.mna;

/** A solved point, as a device reads it to report its own pin currents. */
public interface SolutionView {
	double voltage(int net);

	/** This device's k-th branch current. */
	double branchCurrent(int k);
}
