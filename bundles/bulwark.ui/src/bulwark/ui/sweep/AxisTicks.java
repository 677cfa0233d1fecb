package bulwark.ui.sweep;

import java.util.ArrayList;
import java.util.List;

/**
 * Tick positions (log10) on a logarithmic axis, denser as the axis is zoomed: every second decade, every
 * decade, then 1-2-5 in each decade, then every mantissa — about three to ten ticks whatever the span.
 */
public final class AxisTicks {
	private AxisTicks() {
	}

	public static List<Double> logarithmic(double lo, double hi) {
		double span = hi - lo;
		int[] mantissas = span >= 2 ? new int[] { 1 } : span >= 0.6 ? new int[] { 1, 2, 5 } : new int[] { 1, 2, 3, 4, 5, 6, 7, 8, 9 };
		int decadeStep = span >= 6 ? 2 : 1;
		List<Double> ticks = new ArrayList<>();
		for (int d = (int) Math.floor(lo); d <= Math.ceil(hi); d += decadeStep) {
			for (int m : mantissas) {
				double t = d + Math.log10(m);
				if (t >= lo - 1e-9 && t <= hi + 1e-9) {
					ticks.add(t);
				}
			}
		}
		if (ticks.size() < 2 && span < 0.6) {
			// inside one mantissa step: the ends themselves
			ticks.clear();
			ticks.add(lo);
			ticks.add(hi);
		}
		return ticks;
	}
}
