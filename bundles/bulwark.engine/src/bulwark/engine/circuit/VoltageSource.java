package bulwark.engine.circuit;

import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;
import bulwark.engine.source.Waveform;

/**
 * An EMF of {@code volts} (plus pin a, minus pin b) in series with an internal resistance, which may be
 * zero (an ideal supply). A battery is this with its internal resistance (Thevenin model). The branch
 * current is the current into the plus pin; a source that delivers power has a negative one. The internal
 * resistance enters the branch equation, v+ − v− − R·i = E, so no hidden net is needed.
 */
public final class VoltageSource extends TwoTerminal {
	private final Waveform waveform;
	private final double seriesOhms;

	public VoltageSource(String name, int plus, int minus, double volts, double seriesOhms) {
		this(name, plus, minus, checked(name, volts), seriesOhms);
	}

	/** A source whose EMF follows a waveform in a transient (its value at t = 0 in an operating point). */
	public VoltageSource(String name, int plus, int minus, Waveform waveform, double seriesOhms) {
		super(name, plus, minus);
		if (!(seriesOhms >= 0) || Double.isInfinite(seriesOhms)) {
			throw new IllegalArgumentException(name + ": internal resistance must be non-negative and finite");
		}
		this.waveform = waveform;
		this.seriesOhms = seriesOhms;
	}

	private static Waveform checked(String name, double volts) {
		if (!Double.isFinite(volts)) {
			throw new IllegalArgumentException(name + ": EMF must be finite");
		}
		return Waveform.constant(volts);
	}

	public static VoltageSource ideal(String name, int plus, int minus, double volts) {
		return new VoltageSource(name, plus, minus, volts, 0);
	}

	/** The EMF at t = 0 (the operating point's value). */
	public double volts() {
		return waveform.at(0);
	}

	public Waveform waveform() {
		return waveform;
	}

	public double seriesOhms() {
		return seriesOhms;
	}

	@Override
	public String[] pinNames() {
		return new String[] { "plus", "minus" };
	}

	@Override
	public int branchCount() {
		return 1;
	}

	@Override
	public boolean idealVoltage() {
		return seriesOhms == 0;
	}

	@Override
	public void stamp(Stamp s) {
		s.incidence(0, a, b);
		s.branchBranch(0, 0, -seriesOhms);
		s.branchRhs(0, waveform.at(s.time()) * s.sourceScale());
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		double i = x.branchCurrent(0);
		return new double[] { i, -i };
	}
}
