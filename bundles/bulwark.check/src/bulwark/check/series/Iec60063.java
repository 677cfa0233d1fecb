package bulwark.check.series;

/**
 * IEC 60063 preferred numbers. E6, E12 and E24 are tables (they do not follow the rounding formula, which
 * gives 2.6, 3.2, 4.6, 8.3 …; docs/sources.md#preferred-values [published]); E48, E96 and E192 are round(10^(i/n)) to three
 * figures [published], with E192's one published exception, 9.20 where the formula gives 9.19 [unconfirmed].
 * Each series belongs with a tolerance: E6 ±20 %, E12 ±10 %, E24 ±5 %, E48 ±2 %, E96 ±1 %, E192 ±0.5 % or
 * tighter [published, IEC 60063].
 */
public final class Iec60063 {
	static final double[] E6 = { 1.0, 1.5, 2.2, 3.3, 4.7, 6.8 };
	static final double[] E12 = { 1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2 };
	static final double[] E24 = { 1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7,
			5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1 };

	private Iec60063() {
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
				if (n == 192 && m[i] == 9.19) {
					m[i] = 9.20;
				}
			}
			return m;
		default:
			throw new IllegalArgumentException("IEC 60063 has E6, E12, E24, E48, E96 and E192, not E" + n);
		}
	}

	/** The series that goes with a tolerance in percent. */
	public static int seriesFor(double tolerancePercent) {
		if (tolerancePercent <= 0.5) {
			return 192;
		}
		if (tolerancePercent <= 1) {
			return 96;
		}
		if (tolerancePercent <= 2) {
			return 48;
		}
		if (tolerancePercent <= 5) {
			return 24;
		}
		return tolerancePercent <= 10 ? 12 : 6;
	}

	/**
	 * Whether a part of the given tolerance with this value is a stock value: in the tolerance's series or any
	 * coarser one (a ±1 % part is made in E24 values too) [common practice].
	 */
	public static boolean stocked(double value, double tolerancePercent) {
		return Math.abs(nearestStocked(value, tolerancePercent) / value - 1) < 1e-3;
	}

	/** The nearest stock value for a part of the given tolerance. */
	public static double nearestStocked(double value, double tolerancePercent) {
		double best = Double.NaN;
		for (int n : new int[] { 6, 12, 24, 48, 96, 192 }) {
			if (n > seriesFor(tolerancePercent)) {
				break;
			}
			double v = nearest(value, n);
			if (Double.isNaN(best) || Math.abs(Math.log(v / value)) < Math.abs(Math.log(best / value))) {
				best = v;
			}
		}
		return best;
	}

	/** Whether the value is in the series (to 0.1 % of itself, what three figures can say). */
	public static boolean contains(double value, int n) {
		return Math.abs(nearest(value, n) / value - 1) < 1e-3;
	}

	/** The value of the series nearest to {@code value} (on a logarithmic scale). */
	public static double nearest(double value, int n) {
		double best = Double.NaN;
		int decade = (int) Math.floor(Math.log10(value));
		for (int d = decade - 1; d <= decade + 1; d++) {
			for (double m : series(n)) {
				double v = m * Math.pow(10, d);
				if (Double.isNaN(best) || Math.abs(Math.log(v / value)) < Math.abs(Math.log(best / value))) {
					best = v;
				}
			}
		}
		return best;
	}
}
