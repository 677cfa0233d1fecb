package bulwark.check.rules;

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
		if (value == 0 || !Double.isFinite(value)) {
			return (value == 0 ? "0" : Double.toString(value)) + " " + unit;
		}
		int exponent = (int) Math.floor(Math.log10(Math.abs(value)) / 3) * 3;
		if (exponent < -15) {
			return String.format(Locale.ROOT, "%.3g", value) + " " + unit; // below any prefix worth reading
		}
		exponent = Math.min(9, exponent);
		double mantissa = value / Math.pow(10, exponent);
		if (Math.abs(Double.parseDouble(String.format(Locale.ROOT, "%.3g", mantissa))) >= 1000 && exponent < 9) {
			exponent += 3;
			mantissa = value / Math.pow(10, exponent);
		}
		String digits = String.format(Locale.ROOT, "%.3g", mantissa);
		if (digits.contains(".")) {
			digits = digits.replaceAll("0+$", "").replaceAll("\\.$", "");
		}
		return digits + " " + PREFIXES[exponent / 3 + 5] + unit;
	}
}
