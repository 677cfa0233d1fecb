package bulwark.engine.circuit;

import bulwark.engine.device.Junction;
import bulwark.engine.device.MosfetModel;
import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;

/**
 * An n- or p-channel MOSFET with pins drain, gate, source; see {@link MosfetModel}. The gate draws no
 * current. The channel is stamped as its linearisation in (vgs, vds), analytic derivatives by central
 * differences of the square law (it is piecewise polynomial, so the differences are exact to rounding
 * within a region); the body diode is stamped like a diode, with junction limiting.
 */
public final class Mosfet extends MultiTerminal {
	public enum Channel {
		N(1), P(-1);

		final double sign;

		Channel(double sign) {
			this.sign = sign;
		}
	}

	private static final int D = 0, G = 1, S = 2;
	private static final double STEP = 1e-7;

	private final Channel channel;
	private final MosfetModel model;

	public Mosfet(String name, int drain, int gate, int source, Channel channel, MosfetModel model) {
		super(name, drain, gate, source);
		this.channel = channel;
		this.model = model;
	}

	@Override
	public String[] pinNames() {
		return new String[] { "drain", "gate", "source" };
	}

	@Override
	public int stateSize() {
		return 2; // body diode voltage, and whether there is one
	}

	@Override
	public boolean nonlinear() {
		return true;
	}

	@Override
	public void stamp(Stamp s) {
		double vd = s.voltage(pins[D]), vg = s.voltage(pins[G]), vs = s.voltage(pins[S]);
		// channel current into the drain as a function of the three pin voltages
		double i0 = channel(vd, vg, vs);
		double[] v = { vd, vg, vs };
		double[] g = new double[3];
		for (int k = 0; k < 3; k++) {
			double h = STEP * Math.max(1, Math.abs(v[k]));
			double keep = v[k];
			v[k] = keep + h;
			double up = channel(v[0], v[1], v[2]);
			v[k] = keep - h;
			double down = channel(v[0], v[1], v[2]);
			v[k] = keep;
			g[k] = (up - down) / (2 * h);
		}
		double linear = g[0] * vd + g[1] * vg + g[2] * vs;
		for (int k = 0; k < 3; k++) {
			s.netNet(pins[D], pins[k], g[k]);
			s.netNet(pins[S], pins[k], -g[k]);
		}
		s.injectNet(pins[D], -(i0 - linear));
		s.injectNet(pins[S], i0 - linear);
		s.conductance(pins[D], pins[S], Junction.GMIN);
		// body diode: anode at the source for an n-channel part, at the drain for a p-channel one
		int anode = channel == Channel.N ? pins[S] : pins[D];
		int cathode = channel == Channel.N ? pins[D] : pins[S];
		JunctionStamp.stamp(s, model.bodyDiode(), anode, cathode, s.state(), 0);
	}

	/** Channel current into the drain pin (negative when it flows out), either channel, either direction. */
	private double channel(double vd, double vg, double vs) {
		double sign = channel.sign;
		double vds = sign * (vd - vs);
		if (vds >= 0) {
			return sign * model.drainCurrent(sign * (vg - vs), vds);
		}
		// reversed: the drain acts as the source
		return -sign * model.drainCurrent(sign * (vg - vd), -vds);
	}

	@Override
	public String[] junctionNames() {
		return new String[] { "body" };
	}

	@Override
	public double[] reverseVoltages(SolutionView x) {
		return new double[] { channel.sign * (x.voltage(pins[D]) - x.voltage(pins[S])) };
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		double vd = x.voltage(pins[D]), vg = x.voltage(pins[G]), vs = x.voltage(pins[S]);
		double i = channel(vd, vg, vs) + Junction.GMIN * (vd - vs);
		double body = channel == Channel.N ? -model.bodyDiode().current(vs - vd) : model.bodyDiode().current(vd - vs);
		return new double[] { i + body, 0, -(i + body) };
	}
}
