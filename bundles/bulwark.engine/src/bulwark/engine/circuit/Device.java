package bulwark.engine.circuit;

/**
 * A two-terminal device of the compiled circuit. Its pins are net indices; current is positive when it
 * flows into {@link #pinA()} and out of {@link #pinB()} through the device.
 */
public sealed interface Device permits Resistor, VoltageSource, CurrentSource {
	/** The designator the device came from, used to report results and failures. */
	String name();

	int pinA();

	int pinB();
}
