package bulwark.check.tolerance;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import bulwark.check.compile.Variation;

/**
 * Extreme-value analysis: each toleranced parameter alone at both its limits gives the direction in which
 * it moves each figure; then, for each figure, every parameter at the limit that raises it, and every one at
 * the limit that lowers it, gives the figure's extremes (the worst case of a monotonic response, which
 * resistive networks and their thresholds are). Two evaluations per parameter, two per figure.
 */
public final class Corners {
	/** A figure's nominal value and its extremes over the tolerance box. */
	public record Range(Figure figure, double nominal, double low, double high) {
	}

	/** The extremes of every figure, and evaluations that failed (named, never dropped). */
	public record Result(List<Range> ranges, List<String> failures, boolean cancelled) {
	}

	private Corners() {
	}

	public static Result run(Evaluator evaluator, List<Toleranced> toleranced, Progress progress) {
		int total = 1 + 2 * toleranced.size();
		Evaluation nominal = evaluator.evaluate(new Variation(Map.of()));
		java.util.List<String> failures = new java.util.ArrayList<>();
		if (!nominal.solved()) {
			return new Result(List.of(), List.of("nominal: " + nominal.failure()), false);
		}
		int done = 1;
		progress.done(done, total);
		// the sign with which each parameter moves each figure
		Map<Figure, Map<String, Integer>> direction = new HashMap<>();
		for (Toleranced t : toleranced) {
			if (progress.cancelled()) {
				return new Result(List.of(), failures, true);
			}
			Evaluation up = evaluator.evaluate(new Variation(Map.of(t.key(), 1 + t.fraction())));
			Evaluation down = evaluator.evaluate(new Variation(Map.of(t.key(), 1 - t.fraction())));
			progress.done(done += 2, total);
			if (!up.solved() || !down.solved()) {
				failures.add(t.key() + " at its limits: " + (up.solved() ? down.failure() : up.failure()));
				continue;
			}
			for (Figure f : nominal.figures().keySet()) {
				Double u = up.figures().get(f), d = down.figures().get(f);
				if (u != null && d != null) {
					direction.computeIfAbsent(f, k -> new HashMap<>()).put(t.key(), (int) Math.signum(u - d));
				}
			}
		}
		List<Range> ranges = new java.util.ArrayList<>();
		Map<Map<String, Double>, Evaluation> evaluated = new LinkedHashMap<>();
		for (Map.Entry<Figure, Double> n : nominal.figures().entrySet()) {
			if (progress.cancelled()) {
				return new Result(ranges, failures, true);
			}
			Figure f = n.getKey();
			Map<String, Integer> dir = direction.getOrDefault(f, Map.of());
			double high = corner(evaluator, toleranced, dir, +1, f, evaluated, failures, n.getValue());
			double low = corner(evaluator, toleranced, dir, -1, f, evaluated, failures, n.getValue());
			ranges.add(new Range(f, n.getValue(), Math.min(low, Math.min(high, n.getValue())),
					Math.max(high, Math.max(low, n.getValue()))));
		}
		return new Result(ranges, failures, false);
	}

	private static double corner(Evaluator evaluator, List<Toleranced> toleranced, Map<String, Integer> dir, int sense,
			Figure f, Map<Map<String, Double>, Evaluation> evaluated, List<String> failures, double nominal) {
		Map<String, Double> factors = new HashMap<>();
		for (Toleranced t : toleranced) {
			int d = dir.getOrDefault(t.key(), 0);
			if (d != 0) {
				factors.put(t.key(), 1 + sense * d * t.fraction());
			}
		}
		Evaluation e = evaluated.computeIfAbsent(factors, k -> evaluator.evaluate(new Variation(k)));
		if (!e.solved()) {
			failures.add(f.name() + " corner: " + e.failure());
			return nominal;
		}
		return e.figures().getOrDefault(f, nominal);
	}
}
