package bulwark.engine.solve;

import java.util.ArrayList;
import java.util.List;

import bulwark.engine.circuit.Device;
import bulwark.engine.mna.TransientStep;

/**
 * Transient analysis: the operating point at t = 0, then time steps by the trapezoidal rule (backward
 * Euler on the first step), each solved by Newton–Raphson on the devices' companion models. The step is
 * controlled by the local truncation error of what the reactive devices integrate (capacitor voltages,
 * inductor currents), estimated by Milne's device: the trapezoidal solution against a quadratic
 * extrapolation of the last three accepted points; for equal steps their error constants are
 * −1/12 and 1, so LTE ≈ |corrector − predictor| / 13 (Lambert, Numerical Methods for Ordinary Differential
 * Systems, Wiley 1991, §4.3; Nagel, ERL memo M520, 1975, §3.6, applies the same idea to charges). A step whose LTE
 * exceeds {@link #RELATIVE}·|q| + {@link #ABSOLUTE} for any integrated quantity q is retried shorter; a step Newton cannot solve
 * is retried an eighth as long, down to {@link #SMALLEST_STEP_FRACTION} of the largest step.
 */
public final class TransientSolver {
	/** Below this fraction of the largest step, a failing step ends the run with TIMESTEP_TOO_SMALL. */
	static final double SMALLEST_STEP_FRACTION = 1e-9;
	/** Accepted relative error per step of an integrated quantity. */
	static final double RELATIVE = 1e-3;
	/** Accepted absolute error per step of an integrated quantity (V or A). */
	static final double ABSOLUTE = 1e-6;

	private final DcSolver solver;

	public TransientSolver(DcSolver solver) {
		this.solver = solver;
	}

	/** Runs from 0 to {@code stop} seconds with steps no longer than {@code maxStep}. */
	public TransientResult run(PreparedCircuit prepared, double stop, double maxStep) {
		return run(prepared, stop, maxStep, Math.min(maxStep, stop) / 64);
	}

	/**
	 * As {@link #run(PreparedCircuit, double, double)}, with the first step given: a source that jumps at
	 * t = 0 (a switch closing) is seen at t = 0+ only as closely as the first step allows.
	 */
	public TransientResult run(PreparedCircuit prepared, double stop, double maxStep, double firstStep) {
		if (!(stop > 0 && maxStep > 0 && firstStep > 0)) {
			throw new IllegalArgumentException("stop time and steps must be positive");
		}
		DcResult op = solver.solve(prepared);
		if (!(op instanceof DcSolution start)) {
			return new TransientResult(new ArrayList<>(), new ArrayList<>(), (SolveFailure) op, 0);
		}
		return integrate(prepared, start, 0, null, stop, maxStep, firstStep);
	}

	/**
	 * Runs on from the end of an earlier completed run of the same prepared circuit to {@code stop}, every
	 * device's state (capacitor voltages, inductor currents, a protector's time over its trip current) carried
	 * over; the first step is backward Euler, as after a discontinuity. Long runs go in pieces this way
	 * without keeping every point.
	 */
	public TransientResult continueFrom(PreparedCircuit prepared, TransientResult previous, double stop,
			double maxStep) {
		if (!previous.completed() || previous.endState == null) {
			throw new IllegalArgumentException("only a completed run can be continued");
		}
		double from = previous.times().get(previous.times().size() - 1);
		if (!(stop > from && maxStep > 0)) {
			throw new IllegalArgumentException("the run must end after it starts, with a positive largest step");
		}
		return integrate(prepared, previous.points().get(previous.points().size() - 1), from, previous.endState, stop,
				maxStep, Math.min(maxStep, stop - from) / 64);
	}

	/** Steps from an accepted point: the operating point (history null) or the end of an earlier run. */
	private TransientResult integrate(PreparedCircuit prepared, DcSolution start, double from, double[][] history,
			double stop, double maxStep, double firstStep) {
		if (!(stop > from && maxStep > 0)) {
			throw new IllegalArgumentException("stop time and largest step must be positive");
		}
		List<Double> times = new ArrayList<>();
		List<DcSolution> points = new ArrayList<>();
		Layout layout = prepared.layout;
		Assembly assembly = new Assembly(layout);
		boolean nonlinear = layout.circuit.devices().stream().anyMatch(Device::nonlinear);
		if (history == null) {
			assembly.acceptPoint(start.unknowns, null);
		} else {
			assembly.restoreHistories(history, from);
		}
		times.add(from);
		points.add(start);
		double[][] recent = { start.unknowns, null, null };
		double[][] integrated = { integrated(layout, assembly, start.unknowns), null, null };
		double[] recentTimes = { from, Double.NaN, Double.NaN };
		double t = from;
		double h = firstStep;
		double smallest = maxStep * SMALLEST_STEP_FRACTION;
		boolean first = true;
		int rejected = 0;
		while (t < stop - 1e-12 * stop) {
			h = Math.min(Math.min(h, maxStep), stop - t);
			TransientStep step = new TransientStep(t + h, h, !first);
			DcSolver.Attempt a = solver.newton(layout, assembly, recent[0], 1, 0, nonlinear, step);
			if (!a.converged()) {
				rejected++;
				h /= 8;
				if (h < smallest) {
					return new TransientResult(times, points, new SolveFailure(SolveFailure.Reason.TIMESTEP_TOO_SMALL,
							layout.place(a.worst()), "the transient stopped at t = " + t + " s: no convergence even with a "
									+ h * 8 + " s step, the largest last change at " + layout.describe(a.worst())),
							rejected);
				}
				continue;
			}
			double grow = 2;
			double[] now = integrated(layout, assembly, a.x());
			if (integrated[2] != null && step.trapezoidal()) {
				double ratio = errorRatio(now, integrated, recentTimes, t + h);
				if (ratio > 1) {
					rejected++;
					h *= Math.max(0.25, 0.9 * Math.cbrt(1 / ratio));
					continue;
				}
				grow = ratio == 0 ? 2 : Math.min(2, 0.9 * Math.cbrt(1 / ratio));
			}
			t += h;
			points.add(DcSolver.solution(layout, assembly, a.x(), a.iterations(), Strategy.NEWTON));
			times.add(t);
			assembly.acceptPoint(a.x(), step);
			recent[2] = recent[1];
			recent[1] = recent[0];
			recent[0] = a.x().clone();
			integrated[2] = integrated[1];
			integrated[1] = integrated[0];
			integrated[0] = now;
			recentTimes[2] = recentTimes[1];
			recentTimes[1] = recentTimes[0];
			recentTimes[0] = t;
			first = false;
			h *= grow;
		}
		return new TransientResult(times, points, null, rejected, assembly.copyHistories());
	}

	/** What every reactive device integrates, at a solution (NaN for the others). */
	private static double[] integrated(Layout layout, Assembly assembly, double[] x) {
		double[] q = new double[layout.devices.length];
		for (int i = 0; i < q.length; i++) {
			q[i] = layout.devices[i].integrated(assembly.view(x, i));
		}
		return q;
	}

	/** Largest LTE over the integrated quantities, as a multiple of what a step may make (>1: reject). */
	private static double errorRatio(double[] corrector, double[][] recent, double[] times, double t) {
		double t0 = times[0], t1 = times[1], t2 = times[2];
		// Lagrange weights of the quadratic through the last three points, evaluated at t
		double w0 = (t - t1) * (t - t2) / ((t0 - t1) * (t0 - t2));
		double w1 = (t - t0) * (t - t2) / ((t1 - t0) * (t1 - t2));
		double w2 = (t - t0) * (t - t1) / ((t2 - t0) * (t2 - t1));
		double worst = 0;
		for (int i = 0; i < corrector.length; i++) {
			if (Double.isNaN(corrector[i])) {
				continue;
			}
			double predicted = w0 * recent[0][i] + w1 * recent[1][i] + w2 * recent[2][i];
			double lte = Math.abs(corrector[i] - predicted) / 13;
			double allowed = RELATIVE * Math.max(Math.abs(corrector[i]), Math.abs(recent[0][i])) + ABSOLUTE;
			worst = Math.max(worst, lte / allowed);
		}
		return worst;
	}
}
