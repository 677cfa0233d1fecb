package bulwark.lang.ide.fixes;

import java.util.ArrayList;
import java.util.List;

/**
 * IEC 60063 preferred numbers. E6, E12 and E24 are tables (they do not follow the rounding formula, which
 * gives 2.6, 3.2, 4.6, 8.3 …; sources.md [published]); E48, E96 and E192 are round(10^(i/n)) to three
 * figures [published], with E192's one published exception, 9.20 where the formula gives 9.19 [memory].
 */
public final class PreferredValues {
	static final double[] E6 = { 1.0, 1.5, 2.2, 3.3, 4.7, 6.8 };
	static final double[] E12 = { 1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2 };
	static final double[] E24 = { 1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7,
			5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1 };

	private PreferredValues() {
	}

	/** The mantissas (1 ≤ m < 10) of a series: 6, 12, 24, 48, 96 or 192. */
	public static double[] series(int n) {
		switch (n) {
		case 6:
			return E6.clone();
		case 12:
			return E12.clone();
		case 24:
			return E24.clone();
		case 48:
		case 96:
		case 192:
			double[] m = new double[n];
			for (int i = 0; i < n; i++) {
				m[i] = Math.round(100 * Math.pow(10, (double) i / n)) / 100.0;
			}
			if (n == 192) {
				for (int i = 0; i < n; i++) {
					if (m[i] == 9.19) {
						m[i] = 9.20;
					}
				}
			}
			return m;
		default:
			throw new IllegalArgumentException("IEC 60063 has E6, E12, E24, E48, E96 and E192, not E" + n);
		}
	}

	/** The value of the series nearest to {@code value} (on a logarithmic scale). */
	public static double nearest(double value, int n) {
		double best = Double.NaN;
		for (double v : candidates(value, n)) {
			if (Double.isNaN(best) || Math.abs(Math.log(v / value)) < Math.abs(Math.log(best / value))) {
				best = v;
			}
		}
		return best;
	}

	/** The smallest value of the series at or above {@code value}. */
	public static double atLeast(double value, int n) {
		double best = Double.POSITIVE_INFINITY;
		for (double v : candidates(value, n)) {
			if (v >= value * (1 - 1e-12) && v < best) {
				best = v;
			}
		}
		return best;
	}

	/** The largest value of the series at or below {@code value}. */
	public static double atMost(double value, int n) {
		double best = 0;
		for (double v : candidates(value, n)) {
			if (v <= value * (1 + 1e-12) && v > best) {
				best = v;
			}
		}
		return best;
	}

	private static List<Double> candidates(double value, int n) {
		int decade = (int) Math.floor(Math.log10(value));
		List<Double> list = new ArrayList<>();
		for (int d = decade - 1; d <= decade + 1; d++) {
			for (double m : series(n)) {
				list.add(m * Math.pow(10, d));
			}
		}
		return list;
	}
}
