package bulwark.engine.circuit;

import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;

/** Linear resistor between pins a and b; Ohm's law. Fuses and indicator loads are resistors with more to say. */
public class Resistor extends TwoTerminal {
	private final double ohms;

	public Resistor(String name, int a, int b, double ohms) {
		super(name, a, b);
		if (!(ohms > 0) || Double.isInfinite(ohms)) {
			throw new IllegalArgumentException(name + ": resistance must be positive and finite, was " + ohms);
		}
		this.ohms = ohms;
	}

	public double ohms() {
		return ohms;
	}

	@Override
	public final String[] pinNames() {
		return new String[] { "a", "b" };
	}

	@Override
	public final void stamp(Stamp s) {
		s.conductance(a, b, 1.0 / ohms);
	}

	@Override
	public final double[] pinCurrents(SolutionView x) {
		double i = (x.voltage(a) - x.voltage(b)) / ohms;
		return new double[] { i, -i };
	}
}
