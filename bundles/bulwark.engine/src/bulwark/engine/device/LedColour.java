package bulwark.engine.device;

/**
 * Default forward voltages of indicator LEDs by colour at 20 mA, the middle of each published range
 * (docs/sources.md#leds, "LED forward voltage ranges by colour" [published, encyclopaedic]): red 1.63–2.03 V, orange
 * 2.03–2.10, yellow 2.10–2.18, green 1.9–4.0, blue 2.48–3.7, violet 2.76–4.0, white about 3.5.
 */
public enum LedColour {
	RED(1.63, 2.03), ORANGE(2.03, 2.10), YELLOW(2.10, 2.18), GREEN(1.9, 4.0), BLUE(2.48, 3.7), VIOLET(2.76, 4.0),
	WHITE(3.5, 3.5);

	private final double low;
	private final double high;

	LedColour(double low, double high) {
		this.low = low;
		this.high = high;
	}

	public double lowest() {
		return low;
	}

	public double highest() {
		return high;
	}

	/** The default forward voltage at 20 mA: the middle of the range. */
	public double forwardVolts() {
		return (low + high) / 2;
	}
}
