package bulwark.check.tolerance;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;

import bulwark.check.policy.Distribution;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;

import bulwark.check.compile.Variation;

/**
 * Monte Carlo tolerance analysis: N samples, each parameter drawn within its tolerance — uniformly, or
 * normally with 3σ at the tolerance (cut at it) — from a generator seeded by the run's seed and the sample's
 * index, so that a run is reproducible whatever the number of threads. Samples run in parallel on all cores.
 */
public final class MonteCarlo {
	/** The samples' figures, in sample order; a sample that could not be solved is named, not dropped. */
	public record Result(List<Evaluation> samples, List<String> failures, boolean cancelled) {
	}

	private MonteCarlo() {
	}

	public static Result run(Evaluator evaluator, List<Toleranced> toleranced, int samples, long seed,
			Distribution distribution, Progress progress) {
		AtomicInteger done = new AtomicInteger();
		Evaluation[] results = new Evaluation[samples];
		IntStream.range(0, samples).parallel().forEach(i -> {
			if (progress.cancelled()) {
				return;
			}
			results[i] = evaluator.evaluate(new Variation(draw(toleranced, seed, i, distribution)));
			progress.done(done.incrementAndGet(), samples);
		});
		List<Evaluation> solved = new ArrayList<>();
		List<String> failures = new ArrayList<>();
		for (int i = 0; i < samples; i++) {
			if (results[i] == null) {
				continue;
			}
			if (results[i].solved()) {
				solved.add(results[i]);
			} else {
				failures.add("sample " + i + ": " + results[i].failure());
			}
		}
		return new Result(solved, failures, progress.cancelled());
	}

	/** The factors of sample {@code index}: the same for the same seed, whichever thread draws them. */
	public static Map<String, Double> draw(List<Toleranced> toleranced, long seed, int index, Distribution distribution) {
		SplittableRandom random = new SplittableRandom(seed * 0x9E3779B97F4A7C15L + index);
		Map<String, Double> factors = new HashMap<>();
		for (Toleranced t : toleranced) {
			double u;
			if (distribution == Distribution.NORMAL) {
				u = Math.max(-1, Math.min(1, gaussian(random) / 3)); // 3σ at the tolerance
			} else {
				u = 2 * random.nextDouble() - 1;
			}
			factors.put(t.key(), 1 + u * t.fraction());
		}
		return factors;
	}

	/** A standard normal deviate by the Box–Muller transform (Box &amp; Muller, Ann. Math. Stat. 29, 1958). */
	static double gaussian(SplittableRandom random) {
		double u1 = 1 - random.nextDouble(); // in (0, 1]
		double u2 = random.nextDouble();
		return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
	}

	/** Statistics of each figure over the solved samples, in the order the first sample lists them. */
	public static List<Statistics> statistics(Result result) {
		Map<Figure, List<Double>> values = new LinkedHashMap<>();
		for (Evaluation e : result.samples()) {
			e.figures().forEach((f, v) -> values.computeIfAbsent(f, k -> new ArrayList<>()).add(v));
		}
		List<Statistics> stats = new ArrayList<>();
		values.forEach((f, v) -> stats.add(Statistics.of(f, v.stream().mapToDouble(Double::doubleValue).toArray())));
		return stats;
	}
}
