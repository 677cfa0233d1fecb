package bulwark.ui.stress;

import org.eclipse.swt.graphics.RGB;

/**
 * Bulwark's one continuous colour scale for utilisation of a derated rating: a cool slate at 0 %, warming
 * through sand to a strong amber at 100 %, then darkening to a deep brick red at 200 % and beyond. Drawn
 * in the HSB space so that every step between is a colour of the same family.
 */
public final class UtilisationScale {
	private UtilisationScale() {
	}

	public static RGB of(double utilisation) {
		double u = Math.max(0, Math.min(2, utilisation));
		float hue, saturation, brightness;
		if (u <= 1) {
			hue = (float) (210 - 170 * u); // 210° slate → 40° amber
			saturation = (float) (0.15 + 0.65 * u);
			brightness = 0.95f;
		} else {
			hue = (float) (40 - 32 * (u - 1)); // amber → 8° brick
			saturation = 0.85f;
			brightness = (float) (0.95 - 0.35 * (u - 1));
		}
		return new RGB(hue, saturation, brightness);
	}
}
