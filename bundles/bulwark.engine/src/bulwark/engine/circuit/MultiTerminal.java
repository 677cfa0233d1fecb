package bulwark.engine.circuit;

/** Name and pins of a device with any number of pins, kept in the order of its pin names. */
abstract class MultiTerminal implements Device {
	private final String name;
	protected final int[] pins;

	MultiTerminal(String name, int... pins) {
		this.name = name;
		this.pins = pins.clone();
	}

	@Override
	public final String name() {
		return name;
	}

	@Override
	public final int[] pins() {
		return pins.clone();
	}
}
