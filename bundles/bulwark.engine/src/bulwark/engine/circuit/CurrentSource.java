package bulwark.engine.circuit;

import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;
import bulwark.engine.source.Waveform;

/** Ideal current source: {@code amps} flow from pin a through the source and out of pin b into the circuit. */
public final class CurrentSource extends TwoTerminal {
	private final Waveform waveform;

	public CurrentSource(String name, int a, int b, double amps) {
		this(name, a, b, checked(name, amps));
	}

	/** A source whose current follows a waveform in a transient (its value at t = 0 in an operating point). */
	public CurrentSource(String name, int a, int b, Waveform waveform) {
		super(name, a, b);
		this.waveform = waveform;
	}

	private static Waveform checked(String name, double amps) {
		if (!Double.isFinite(amps)) {
			throw new IllegalArgumentException(name + ": current must be finite");
		}
		return Waveform.constant(amps);
	}

	/** The current at t = 0. */
	public double amps() {
		return waveform.at(0);
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
		s.current(a, b, waveform.at(s.time()) * s.sourceScale());
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		double amps = waveform.at(x.time());
		return new double[] { amps, -amps };
	}
}
