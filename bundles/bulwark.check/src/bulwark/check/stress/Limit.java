package bulwark.check.stress;

import java.util.Locale;

import bulwark.check.figures.Figures;

/**
 * What a stress is compared with: a rating (written, by package, or assumed — {@code basis} says which)
 * times the policy's derating factor.
 */
public record Limit(double rated, String unit, String basis, double factor, String deratingSource) {
	public double value() {
		return rated * factor;
	}

	public boolean derated() {
		return factor < 1;
	}

	/** "its rated 250 mW" or "its rated 250 mW derated to 60 % (150 mW)". */
	public String describe() {
		String r = basis + " " + Figures.engineering(rated, unit);
		return derated() ? String.format(Locale.ROOT, "%s derated to %.0f %% (%s)", r, 100 * factor,
				Figures.engineering(value(), unit)) : r;
	}
}
