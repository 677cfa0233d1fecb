package bulwark.check.figures;

import java.util.Map;

/** A quick fix's before-and-after figures, by name, written as findings write theirs. */
public final class NamedFigures {
	private NamedFigures() {
	}

	/**
	 * Figures as a person reads them, as findings write theirs: "rated 0.125, utilisation 239 %",
	 * "series_ohms 100 kΩ" — never a map's raw doubles. The unit comes from the figure's name where it says
	 * one (…_ohms, …_volts, …_amps, voltage, ohms); a utilisation is a percentage; counts are whole.
	 */
	public static String of(Map<String, Double> figures) {
		java.util.StringJoiner s = new java.util.StringJoiner(", ");
		figures.forEach((name, value) -> s.add(name.replace('_', ' ') + " " + shown(name, value)));
		return s.toString();
	}

	private static String shown(String name, double value) {
		if (!Double.isFinite(value)) {
			return Double.isNaN(value) ? "unknown" : "none";
		}
		if (name.equals("utilisation")) {
			return String.format(java.util.Locale.ROOT, "%.0f %%", 100 * value);
		}
		if (name.equals("parts") || name.equals("blocking_elements")) {
			return String.format(java.util.Locale.ROOT, "%.0f", value);
		}
		String unit = name.endsWith("ohms") ? "Ω" : name.endsWith("volts") || name.equals("voltage") ? "V"
				: name.endsWith("amps") ? "A" : "";
		if (unit.isEmpty()) { // a rating of the part's own unit, which the label names
			return new java.math.BigDecimal(value).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString();
		}
		return Figures.engineering(value, unit);
	}
}
