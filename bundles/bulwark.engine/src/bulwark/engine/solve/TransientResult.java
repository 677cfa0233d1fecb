package bulwark.engine.solve;

import java.util.Collections;
import java.util.List;
import java.util.function.ToDoubleFunction;

/**
 * The accepted time points of a transient, each a full solution (net voltages, every device's pin
 * voltages and currents), and the failure that stopped it early, if one did.
 */
public final class TransientResult {
	private final List<Double> times;
	private final List<DcSolution> points;
	private final SolveFailure failure;
	private final int rejectedSteps;
	/** Every device's history at the last point, so that a run can go on from it; null when it failed. */
	final double[][] endState;

	TransientResult(List<Double> times, List<DcSolution> points, SolveFailure failure, int rejectedSteps) {
		this(times, points, failure, rejectedSteps, null);
	}

	TransientResult(List<Double> times, List<DcSolution> points, SolveFailure failure, int rejectedSteps,
			double[][] endState) {
		this.times = Collections.unmodifiableList(times);
		this.points = Collections.unmodifiableList(points);
		this.failure = failure;
		this.rejectedSteps = rejectedSteps;
		this.endState = endState;
	}

	public boolean completed() {
		return failure == null;
	}

	public SolveFailure failure() {
		return failure;
	}

	public List<Double> times() {
		return times;
	}

	public List<DcSolution> points() {
		return points;
	}

	/** Steps the error control or Newton refused and retried smaller. */
	public int rejectedSteps() {
		return rejectedSteps;
	}

	/** The largest value of a quantity over all accepted points, for example a part's power. */
	public double peak(ToDoubleFunction<DcSolution> quantity) {
		double best = Double.NEGATIVE_INFINITY;
		for (DcSolution p : points) {
			best = Math.max(best, quantity.applyAsDouble(p));
		}
		return best;
	}

	/** A quantity at a time, interpolated linearly between the accepted points around it. */
	public double at(double time, ToDoubleFunction<DcSolution> quantity) {
		if (time <= times.get(0)) {
			return quantity.applyAsDouble(points.get(0));
		}
		for (int i = 1; i < times.size(); i++) {
			if (times.get(i) >= time) {
				double t0 = times.get(i - 1), t1 = times.get(i);
				double v0 = quantity.applyAsDouble(points.get(i - 1)), v1 = quantity.applyAsDouble(points.get(i));
				return v0 + (v1 - v0) * (time - t0) / (t1 - t0);
			}
		}
		return quantity.applyAsDouble(points.get(points.size() - 1));
	}
}
