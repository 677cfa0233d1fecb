package bulwark.engine.circuit;

/** Helpers for devices with two pins, a and b. */
abstract class TwoTerminal implements Device {
	private final String name;
	protected final int a;
	protected final int b;

	TwoTerminal(String name, int a, int b) {
		this.name = name;
		this.a = a;
		this.b = b;
	}

	@Override
	public final String name() {
		return name;
	}

	@Override
	public final int[] pins() {
		return new int[] { a, b };
	}

	public final int pinA() {
		return a;
	}

	public final int pinB() {
		return b;
	}
}
