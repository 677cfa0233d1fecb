package bulwark.engine.source;

/**
 * From {@code low} to {@code high} after {@code delay}, with linear edges, held for {@code width}, repeating
 * every {@code period} (0 for a single pulse).
 */
public record Pulse(double low, double high, double delay, double rise, double fall, double width, double period)
		implements Waveform {
	public Pulse {
		if (!(rise > 0 && fall > 0 && width >= 0 && delay >= 0 && period >= 0)) {
			throw new IllegalArgumentException("pulse edges must take time; widths and delays are not negative");
		}
	}

	/** A step from low to high at {@code delay} with a short rising edge, held for ever. */
	public static Pulse step(double low, double high, double delay, double rise) {
		return new Pulse(low, high, delay, rise, rise, Double.POSITIVE_INFINITY, 0);
	}

	@Override
	public double at(double seconds) {
		double t = seconds - delay;
		if (t < 0) {
			return low;
		}
		if (period > 0) {
			t %= period;
		}
		if (t < rise) {
			return low + (high - low) * t / rise;
		}
		if (t < rise + width) {
			return high;
		}
		if (t < rise + width + fall) {
			return high - (high - low) * (t - rise - width) / fall;
		}
		return low;
	}
}
