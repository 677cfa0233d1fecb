package bulwark.engine.mna;

/**
 * What a device sees while it adds itself to the nodal equations at the present Newton iterate. Rows and
 * columns are nets (the reference net is dropped silently) or the device's own branch currents.
 * A device that is nonlinear adds its linearisation at the present iterate (its companion model):
 * the conductance dI/dV and the current that makes the linear model agree with the device there.
 */
public interface Stamp {

	/** Voltage of a net at the present iterate (0 for the reference net). */
	double voltage(int net);

	/** The present iterate of this device's k-th branch current. */
	double branchCurrent(int k);

	/** Adds to the matrix entry (row of net, column of net). */
	void netNet(int rowNet, int colNet, double value);

	/** Adds to the matrix entry (row of net, column of this device's branch k). */
	void netBranch(int rowNet, int k, double value);

	/** Adds to the matrix entry (row of this device's branch k, column of net). */
	void branchNet(int k, int colNet, double value);

	/** Adds to the matrix entry (row of branch k, column of branch j), both this device's. */
	void branchBranch(int k, int j, double value);

	/** Adds to the right-hand side of a net's equation: current injected into the net. */
	void injectNet(int net, double amps);

	/** Adds to the right-hand side of this device's branch equation k. */
	void branchRhs(int k, double value);

	/** Factor applied to independent sources: 1 normally, less during source stepping. */
	double sourceScale();

	/** Per-device memory between iterations (junction voltages for limiting); sized by the device. */
	double[] state();

	/** Time of the point being solved, s (0 for an operating point). */
	double time();

	/** The integration step of a transient point, or null for an operating point (capacitors open, inductors short). */
	TransientStep transientStep();

	/** The device's values at the last accepted time point (sized by {@link bulwark.engine.circuit.Device#historySize()}). */
	double[] history();

	/** Tells the solver this iterate is not final, for example because a junction voltage was limited. */
	void notConverged();

	/** A conductance g between nets p and q. */
	default void conductance(int p, int q, double g) {
		netNet(p, p, g);
		netNet(q, q, g);
		netNet(p, q, -g);
		netNet(q, p, -g);
	}

	/**
	 * Ties this device's branch current k to nets plus and minus: it leaves plus's equation, enters
	 * minus's, and the branch equation reads v(plus) − v(minus) + … (what every voltage-defined branch shares).
	 */
	default void incidence(int k, int plus, int minus) {
		netBranch(plus, k, 1);
		netBranch(minus, k, -1);
		branchNet(k, plus, 1);
		branchNet(k, minus, -1);
	}

	/** A current of {@code amps} flowing out of net {@code from}, through the device, into net {@code to}. */
	default void current(int from, int to, double amps) {
		injectNet(from, -amps);
		injectNet(to, amps);
	}
}
