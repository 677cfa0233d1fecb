package bulwark.check.tolerance;

import java.util.List;

import bulwark.check.policy.ReviewPolicy;
import bulwark.lang.design.Design;
import bulwark.check.policy.Distribution;

/** Corners, then Monte Carlo, of one design under its review policy. */
public final class ToleranceAnalysis {
	/** Everything a tolerance run found. */
	public record Result(List<Toleranced> toleranced, Corners.Result corners, List<Statistics> statistics,
			List<Yield> yields, MonteCarlo.Result monteCarlo, int samples, long seed,
			Distribution distribution) {
	}

	private ToleranceAnalysis() {
	}

	public static Result run(Design design, ReviewPolicy policy, int samples, long seed,
			Distribution distribution, Progress progress) {
		Evaluator evaluator = new Evaluator(design, policy);
		List<Toleranced> toleranced = Toleranced.of(design);
		int cornerWork = 1 + 2 * toleranced.size();
		Progress corners = new Progress() {
			@Override
			public void done(int finished, int total) {
				progress.done(Math.min(finished, cornerWork), cornerWork + samples);
			}

			@Override
			public boolean cancelled() {
				return progress.cancelled();
			}
		};
		Corners.Result c = Corners.run(evaluator, toleranced, corners);
		Progress sampling = new Progress() {
			@Override
			public void done(int finished, int total) {
				progress.done(cornerWork + finished, cornerWork + samples);
			}

			@Override
			public boolean cancelled() {
				return progress.cancelled();
			}
		};
		MonteCarlo.Result mc = samples > 0 && !c.cancelled()
				? MonteCarlo.run(evaluator, toleranced, samples, seed, distribution, sampling)
				: new MonteCarlo.Result(List.of(), List.of(), c.cancelled());
		return new Result(toleranced, c, MonteCarlo.statistics(mc), Yield.of(design, mc.samples()), mc, samples, seed,
				distribution);
	}
}
