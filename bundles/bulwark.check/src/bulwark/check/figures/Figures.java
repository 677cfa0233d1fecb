package bulwark.check.figures;

import java.util.Locale;

/** Writes SI values with an engineering prefix for messages: 0.3064 W → "306 mW". */
public final class Figures {
	private static final String[] PREFIXES = { "f", "p", "n", "µ", "m", "", "k", "M", "G" };

	private Figures() {
	}

	public static String watts(double w) {
		return engineering(w, "W");
	}

	/** Three significant figures with the prefix that puts the mantissa in [1, 1000); plain below femto. */
	public static String engineering(double value, String unit) {
		return engineering(value, unit, 3);
	}

	/**
	 * A figure over its limit, with as many significant figures as it takes (three to six) not to read equal to
	 * the limit as written: 10.036 mA against 10 mA is "10.04 mA", never "10 mA".
	 */
	public static String over(double value, double limit, String unit) {
		String limitShown = engineering(limit, unit);
		String shown = engineering(value, unit);
		for (int digits = 4; digits <= 6 && value > limit && shown.equals(limitShown); digits++) {
			shown = engineering(value, unit, digits);
		}
		return shown;
	}

	/**
	 * A figure as a percentage of its limit, whole percent unless that would hide which side of the limit it
	 * is on: 100.36 % is "100.4", not "100".
	 */
	public static String percentOf(double value, double limit) {
		double percent = 100 * value / limit;
		for (int decimals = 0; decimals <= 4; decimals++) {
			String shown = String.format(Locale.ROOT, "%." + decimals + "f", percent);
			double read = Double.parseDouble(shown);
			if ((value > limit) == (read > 100) && (value < limit) == (read < 100)) {
				return shown;
			}
		}
		return String.format(Locale.ROOT, "%.4f", percent);
	}

	/**
	 * How far a figure is from its limit, for a finding: "231 % of the limit", or past ten times the limit, the
	 * factor ("51,200× the limit"), for a seven-digit percentage is read by no one.
	 */
	public static String ofTheLimit(double value, double limit) {
		double factor = value / limit;
		if (!Double.isFinite(factor) || Math.abs(factor) <= 10) {
			return percentOf(value, limit) + " % of the limit";
		}
		return factor(factor) + " the limit";
	}

	/** A ratio as a factor of three significant figures, thousands grouped: "12.8×", "51,200×". */
	public static String factor(double ratio) {
		java.math.BigDecimal rounded = new java.math.BigDecimal(ratio).round(new java.math.MathContext(3));
		String shown = rounded.abs().compareTo(java.math.BigDecimal.valueOf(1000)) >= 0
				? String.format(Locale.ROOT, "%,d", rounded.longValue())
				: rounded.stripTrailingZeros().toPlainString();
		return shown + "×";
	}

	/** {@code digits} significant figures with the prefix that puts the mantissa in [1, 1000). */
	static String engineering(double value, String unit, int digits) {
		if (value == 0 || !Double.isFinite(value)) {
			return (value == 0 ? "0" : Double.toString(value)) + " " + unit;
		}
		int exponent = (int) Math.floor(Math.log10(Math.abs(value)) / 3) * 3;
		if (exponent < -15) {
			return String.format(Locale.ROOT, "%." + digits + "g", value) + " " + unit; // below any prefix worth reading
		}
		exponent = Math.min(9, exponent);
		double mantissa = value / Math.pow(10, exponent);
		String format = "%." + digits + "g";
		if (Math.abs(Double.parseDouble(String.format(Locale.ROOT, format, mantissa))) >= 1000 && exponent < 9) {
			exponent += 3;
			mantissa = value / Math.pow(10, exponent);
		}
		String shown = String.format(Locale.ROOT, format, mantissa);
		if (shown.contains(".")) {
			shown = shown.replaceAll("0+$", "").replaceAll("\\.$", "");
		}
		return shown + " " + PREFIXES[exponent / 3 + 5] + unit;
	}
}
