package bulwark.engine.solve;

/**
 * The periodic steady state of a circuit driven by sources of one period, reached by integrating whole
 * periods until one ends where the last ended: every net's voltage at the period boundary within
 * {@link #RELATIVE} of the largest plus {@link #VOLTS}. This is the brute-force method of the literature
 * (Aprille and Trick, "Steady-state analysis of nonlinear circuits with periodic inputs", Proc. IEEE 60(1),
 * 1972, introduce it as the baseline their shooting method accelerates); it needs no more than the transient
 * solver and never claims a steady state it has not reached.
 */
public final class PeriodicSteadyState {
	/** Change of a net's voltage from one period boundary to the next, relative to the largest voltage. */
	public static final double RELATIVE = 1e-4;
	/** Absolute part of the settle test, V. */
	public static final double VOLTS = 1e-3;

	/**
	 * The settled period (its points from one boundary to the next) and how many periods it took; or, with
	 * {@code period} null, the failure.
	 */
	public record Result(TransientResult period, int periods, SolveFailure failure) {
		public boolean settled() {
			return failure == null;
		}
	}

	private final TransientSolver solver;

	public PeriodicSteadyState(TransientSolver solver) {
		this.solver = solver;
	}

	/**
	 * Runs on from the end of {@code start} (a completed run ending on a period boundary) period by period, at
	 * most {@code maxPeriods}, until the state repeats.
	 *
	 * @return the settled period, or the failure: the transient's own, or NO_STEADY_STATE naming the net that
	 *         was still moving
	 */
	public Result run(PreparedCircuit prepared, TransientResult start, double period, double maxStep,
			int maxPeriods) {
		TransientResult previous = start;
		DcSolution boundary = start.points().get(start.points().size() - 1);
		double t = start.times().get(start.times().size() - 1);
		for (int k = 1; k <= maxPeriods; k++) {
			TransientResult one = solver.continueFrom(prepared, previous, t + period, maxStep);
			if (!one.completed()) {
				return new Result(null, k, one.failure());
			}
			DcSolution end = one.points().get(one.points().size() - 1);
			int moving = movingNet(boundary, end);
			if (moving < 0) {
				return new Result(one, k, null);
			}
			if (k == maxPeriods) {
				String net = end.circuit().netName(moving);
				return new Result(null, k, new SolveFailure(SolveFailure.Reason.NO_STEADY_STATE, net, "no periodic steady state after "
						+ maxPeriods + " periods: net " + net + " still moved by "
						+ String.format(java.util.Locale.ROOT, "%.3g", Math.abs(end.voltage(moving) - boundary.voltage(moving)))
						+ " V over the last period"));
			}
			boundary = end;
			previous = one;
			t += period;
		}
		throw new IllegalArgumentException("maxPeriods must be at least 1");
	}

	/** The net whose voltage changed most beyond the settle test, or −1 when none did. */
	private static int movingNet(DcSolution before, DcSolution after) {
		int nets = after.circuit().netCount();
		double largest = 0;
		for (int n = 0; n < nets; n++) {
			largest = Math.max(largest, Math.abs(after.voltage(n)));
		}
		double allowed = RELATIVE * largest + VOLTS;
		int worst = -1;
		double worstChange = allowed;
		for (int n = 0; n < nets; n++) {
			double change = Math.abs(after.voltage(n) - before.voltage(n));
			if (change > worstChange) {
				worstChange = change;
				worst = n;
			}
		}
		return worst;
	}
}
