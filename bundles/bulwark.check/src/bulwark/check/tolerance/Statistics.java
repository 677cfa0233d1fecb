package bulwark.check.tolerance;

import java.util.Arrays;

/** Minimum, maximum, mean and percentiles of one figure over the samples. */
public record Statistics(Figure figure, int count, double min, double max, double mean, double p1, double p50,
		double p99) {

	public static Statistics of(Figure figure, double[] values) {
		double[] v = values.clone();
		Arrays.sort(v);
		double sum = 0;
		for (double x : v) {
			sum += x;
		}
		return new Statistics(figure, v.length, v[0], v[v.length - 1], sum / v.length, percentile(v, 0.01),
				percentile(v, 0.5), percentile(v, 0.99));
	}

	/** Linear interpolation between closest ranks (the "C = 1" definition of Hyndman &amp; Fan, 1996). */
	static double percentile(double[] sorted, double p) {
		double rank = p * (sorted.length - 1);
		int below = (int) Math.floor(rank);
		int above = Math.min(sorted.length - 1, below + 1);
		return sorted[below] + (rank - below) * (sorted[above] - sorted[below]);
	}
}
