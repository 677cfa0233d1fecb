package bulwark.engine.circuit;

/**
 * An EMF of {@code volts} (plus pin = {@link #pinA()}, minus = {@link #pinB()}) in series with an internal
 * resistance, which may be zero (an ideal supply). A battery is this with its internal resistance
 * (Thevenin model). Its current is positive when it flows into the plus pin, i.e. while charging;
 * a source that delivers power has a negative current.
 */
public record VoltageSource(String name, int pinA, int pinB, double volts, double seriesOhms) implements Device {
	public VoltageSource {
		if (!Double.isFinite(volts) || !(seriesOhms >= 0) || Double.isInfinite(seriesOhms)) {
			throw new IllegalArgumentException(name + ": EMF must be finite and internal resistance non-negative");
		}
	}

	public static VoltageSource ideal(String name, int plus, int minus, double volts) {
		return new VoltageSource(name, plus, minus, volts, 0);
	}
}
