package bulwark.engine.circuit;

import bulwark.engine.solve.OperatingPoint;

/**
 * An indicator or buzzer load: resistive, and on when its current reaches its activation current. The
 * threshold sweeps of the function checks ask {@link #isOn} of each solved point.
 */
public final class Indicator extends Resistor {
	private final double activationAmps;

	public Indicator(String name, int a, int b, double ohms, double activationAmps) {
		super(name, a, b, ohms);
		if (!(activationAmps > 0)) {
			throw new IllegalArgumentException(name + ": activation current must be positive");
		}
		this.activationAmps = activationAmps;
	}

	public double activationAmps() {
		return activationAmps;
	}

	public boolean isOn(OperatingPoint point) {
		return Math.abs(point.current()) >= activationAmps;
	}
}
