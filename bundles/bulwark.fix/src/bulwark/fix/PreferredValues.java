package bulwark.fix;

import bulwark.check.series.Iec60063;

/** IEC 60063 preferred values for fixes: the series tables of the check, plus rounding up and down. */
public final class PreferredValues {
	private PreferredValues() {
	}

	public static double[] series(int n) {
		return Iec60063.series(n);
	}

	public static double nearest(double value, int n) {
		return Iec60063.nearest(value, n);
	}

	/** The smallest value of the series at or above {@code value}. */
	public static double atLeast(double value, int n) {
		double best = Double.POSITIVE_INFINITY;
		for (double v : around(value, n)) {
			if (v >= value * (1 - 1e-12) && v < best) {
				best = v;
			}
		}
		return best;
	}

	/** The largest value of the series at or below {@code value}. */
	public static double atMost(double value, int n) {
		double best = 0;
		for (double v : around(value, n)) {
			if (v <= value * (1 + 1e-12) && v > best) {
				best = v;
			}
		}
		return best;
	}

	private static double[] around(double value, int n) {
		double[] m = Iec60063.series(n);
		int decade = (int) Math.floor(Math.log10(value));
		double[] all = new double[3 * m.length];
		for (int d = 0; d < 3; d++) {
			for (int i = 0; i < m.length; i++) {
				all[d * m.length + i] = m[i] * Math.pow(10, decade - 1 + d);
			}
		}
		return all;
	}
}
