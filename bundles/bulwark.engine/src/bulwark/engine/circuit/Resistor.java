package bulwark.engine.circuit;

/** Linear resistor between pins a and b; {@code ohms} must be positive and finite. */
public record Resistor(String name, int pinA, int pinB, double ohms) implements Device {
	public Resistor {
		if (!(ohms > 0) || Double.isInfinite(ohms)) {
			throw new IllegalArgumentException(name + ": resistance must be positive and finite, was " + ohms);
		}
	}
}
