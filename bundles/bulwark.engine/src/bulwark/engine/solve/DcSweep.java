package bulwark.engine.solve;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.DoubleFunction;
import java.util.function.Predicate;

import bulwark.engine.circuit.Device;

/**
 * DC sweeps of one device's value, with continuation: each point starts from the previous point's
 * solution, so a circuit with hysteresis stays on its branch and an upward and a downward sweep can
 * find different switching points. {@link #threshold} finds where a state changes along a sweep direction
 * by stepping and then bisecting, every trial starting from the last solution before the change.
 */
public final class DcSweep {
	private final DcSolver solver;
	private final PreparedCircuit base;
	private final String device;
	private final DoubleFunction<Device> variant;

	/**
	 * @param device  the device whose value is swept
	 * @param variant makes that device at a given value (same kind, same pins)
	 */
	public DcSweep(DcSolver solver, PreparedCircuit base, String device, DoubleFunction<Device> variant) {
		this.solver = solver;
		this.base = base;
		this.device = device;
		this.variant = variant;
	}

	public record Point(double value, DcResult result) {
	}

	/** Solves at each value in the order given, each from the previous solution. */
	public List<Point> run(double[] values) {
		List<Point> points = new ArrayList<>();
		DcSolution previous = null;
		for (double value : values) {
			DcResult r = solveAt(value, previous);
			points.add(new Point(value, r));
			previous = r instanceof DcSolution s ? s : null;
		}
		return points;
	}

	/** What {@link #threshold} found: the value where the state changed, or why it could not be found. */
	public record Threshold(Optional<Double> value, SolveFailure failure) {
		static Threshold none() {
			return new Threshold(Optional.empty(), null);
		}
	}

	/**
	 * The value where {@code state} changes when the swept value moves from {@code from} to {@code to}:
	 * geometric steps (the sweep is of a resistance or a similar positive quantity spanning decades) until
	 * the state differs from the state at {@code from}, then bisection between the last two steps to a
	 * relative width of {@code relativeTolerance}. Returns an empty value when the state never changes.
	 */
	public Threshold threshold(double from, double to, int steps, Predicate<DcSolution> state,
			double relativeTolerance) {
		if (!(from > 0 && to > 0 && steps > 0)) {
			throw new IllegalArgumentException("a threshold sweep runs over positive values");
		}
		DcResult r = solveAt(from, null);
		if (!(r instanceof DcSolution start)) {
			return new Threshold(Optional.empty(), (SolveFailure) r);
		}
		boolean initial = state.test(start);
		double ratio = Math.pow(to / from, 1.0 / steps);
		double before = from;
		DcSolution beforeSolution = start;
		double after = Double.NaN;
		for (int i = 1; i <= steps; i++) {
			double value = i == steps ? to : from * Math.pow(ratio, i);
			DcResult next = solveAt(value, beforeSolution);
			if (!(next instanceof DcSolution s)) {
				return new Threshold(Optional.empty(), (SolveFailure) next);
			}
			if (state.test(s) != initial) {
				after = value;
				break;
			}
			before = value;
			beforeSolution = s;
		}
		if (Double.isNaN(after)) {
			return Threshold.none();
		}
		while (Math.abs(after - before) > relativeTolerance * Math.min(Math.abs(before), Math.abs(after))) {
			double mid = Math.sqrt(before * after);
			DcResult m = solveAt(mid, beforeSolution);
			if (!(m instanceof DcSolution s)) {
				return new Threshold(Optional.empty(), (SolveFailure) m);
			}
			if (state.test(s) == initial) {
				before = mid;
				beforeSolution = s;
			} else {
				after = mid;
			}
		}
		return new Threshold(Optional.of(Math.sqrt(before * after)), null);
	}

	private DcResult solveAt(double value, DcSolution start) {
		return solver.solve(base.with(device, variant.apply(value)), start);
	}
}
