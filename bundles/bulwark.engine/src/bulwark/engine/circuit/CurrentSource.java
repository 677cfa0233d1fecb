package bulwark.engine.circuit;

import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;

/** Ideal current source: {@code amps} flow from pin a through the source and out of pin b into the circuit. */
public final class CurrentSource extends TwoTerminal {
	private final double amps;

	public CurrentSource(String name, int a, int b, double amps) {
		super(name, a, b);
		if (!Double.isFinite(amps)) {
			throw new IllegalArgumentException(name + ": current must be finite");
		}
		this.amps = amps;
	}

	public double amps() {
		return amps;
	}

	@Override
	public String[] pinNames() {
		return new String[] { "a", "b" };
	}

	@Override
	public boolean conductsAtDc() {
		return false;
	}

	@Override
	public void stamp(Stamp s) {
		s.current(a, b, amps * s.sourceScale());
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		return new double[] { amps, -amps };
	}
}
