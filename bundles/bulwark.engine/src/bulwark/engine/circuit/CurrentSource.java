package bulwark.engine.circuit;

/** Ideal current source pushing {@code amps} from pin a through itself out of pin b into the circuit. */
public record CurrentSource(String name, int pinA, int pinB, double amps) implements Device {
	public CurrentSource {
		if (!Double.isFinite(amps)) {
			throw new IllegalArgumentException(name + ": current must be finite");
		}
	}
}
