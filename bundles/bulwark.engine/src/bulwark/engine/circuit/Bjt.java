package bulwark.engine.circuit;

import bulwark.engine.device.BjtModel;
import bulwark.engine.device.Junction;
import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;

/**
 * A bipolar transistor (NPN or PNP) with pins collector, base, emitter; see {@link BjtModel} for the
 * equations. Stamped as its linearisation in (vbe, vbc) at the limited junction voltages.
 */
public final class Bjt extends MultiTerminal {
	public enum Polarity {
		NPN(1), PNP(-1);

		final double sign;

		Polarity(double sign) {
			this.sign = sign;
		}
	}

	private static final int C = 0, B = 1, E = 2;

	private final Polarity polarity;
	private final BjtModel model;

	public Bjt(String name, int collector, int base, int emitter, Polarity polarity, BjtModel model) {
		super(name, collector, base, emitter);
		this.polarity = polarity;
		this.model = model;
	}

	@Override
	public String[] pinNames() {
		return new String[] { "collector", "base", "emitter" };
	}

	@Override
	public int stateSize() {
		return 3; // last vbe, last vbc, whether there are any
	}

	@Override
	public boolean nonlinear() {
		return true;
	}

	@Override
	public void stamp(Stamp s) {
		double sign = polarity.sign;
		double vbe = sign * (s.voltage(pins[B]) - s.voltage(pins[E]));
		double vbc = sign * (s.voltage(pins[B]) - s.voltage(pins[C]));
		double[] state = s.state();
		if (state[2] != 0) {
			double vt = model.thermalVoltage();
			double nfvt = model.forwardEmission() * vt;
			double nrvt = model.reverseEmission() * vt;
			double limitedBe = Junction.limit(vbe, state[0], nfvt, Junction.criticalVoltage(model.saturationCurrent(), nfvt));
			limitedBe = Junction.limitBreakdown(limitedBe, state[0], model.emitterBaseBreakdown(), vt,
					model.breakdownCurrent());
			double limitedBc = Junction.limit(vbc, state[1], nrvt, Junction.criticalVoltage(model.saturationCurrent(), nrvt));
			if (limitedBe != vbe || limitedBc != vbc) {
				s.notConverged();
				vbe = limitedBe;
				vbc = limitedBc;
			}
		}
		state[0] = vbe;
		state[1] = vbc;
		state[2] = 1;
		Currents c = currents(vbe, vbc);
		// Pin currents are sign·Î(vbe, vbc) with vbe = sign·(vb − ve), vbc = sign·(vb − vc), so
		// ∂I/∂vb = ∂Î/∂vbe + ∂Î/∂vbc, ∂I/∂ve = −∂Î/∂vbe, ∂I/∂vc = −∂Î/∂vbc (sign² = 1).
		double[][] d = { { c.dIcBe, c.dIcBc }, { c.dIbBe, c.dIbBc }, { -c.dIcBe - c.dIbBe, -c.dIcBc - c.dIbBc } };
		double[] i = { c.ic, c.ib, -c.ic - c.ib };
		for (int p = 0; p < 3; p++) {
			double gb = d[p][0] + d[p][1];
			double ge = -d[p][0];
			double gc = -d[p][1];
			s.netNet(pins[p], pins[B], gb);
			s.netNet(pins[p], pins[E], ge);
			s.netNet(pins[p], pins[C], gc);
			// the linear model's current at the expansion point must equal the device's: I0 − Σ G·v0
			double linearPart = d[p][0] * vbe + d[p][1] * vbc;
			s.injectNet(pins[p], -sign * (i[p] - linearPart));
		}
	}

	@Override
	public String[] junctionNames() {
		return new String[] { "base-emitter", "base-collector" };
	}

	@Override
	public double[] reverseVoltages(SolutionView x) {
		double sign = polarity.sign;
		double vb = x.voltage(pins[B]);
		return new double[] { sign * (x.voltage(pins[E]) - vb), sign * (x.voltage(pins[C]) - vb) };
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		double sign = polarity.sign;
		double vbe = sign * (x.voltage(pins[B]) - x.voltage(pins[E]));
		double vbc = sign * (x.voltage(pins[B]) - x.voltage(pins[C]));
		Currents c = currents(vbe, vbc);
		return new double[] { sign * c.ic, sign * c.ib, -sign * (c.ic + c.ib) };
	}

	/** Collector and base currents of the NPN equivalent, and their derivatives. */
	private Currents currents(double vbe, double vbc) {
		double vt = model.thermalVoltage();
		double nfvt = model.forwardEmission() * vt;
		double nrvt = model.reverseEmission() * vt;
		double is = model.saturationCurrent();
		double iF = is * (Junction.exp(vbe / nfvt) - 1) + Junction.GMIN * vbe;
		double gF = is / nfvt * Junction.expSlope(vbe / nfvt) + Junction.GMIN;
		double iR = is * (Junction.exp(vbc / nrvt) - 1) + Junction.GMIN * vbc;
		double gR = is / nrvt * Junction.expSlope(vbc / nrvt) + Junction.GMIN;
		double br = model.reverseBeta();
		double bf = model.forwardBeta();
		double ic = iF - iR * (1 + 1 / br);
		double ib = iF / bf + iR / br;
		double dIbBe = gF / bf;
		if (Double.isFinite(model.emitterBaseBreakdown())) {
			double x = -(vbe + model.emitterBaseBreakdown()) / vt;
			ib -= model.breakdownCurrent() * Junction.exp(x);
			dIbBe += model.breakdownCurrent() / vt * Junction.expSlope(x);
		}
		return new Currents(ic, ib, gF, -gR * (1 + 1 / br), dIbBe, gR / br);
	}

	private record Currents(double ic, double ib, double dIcBe, double dIcBc, double dIbBe, double dIbBc) {
	}
}
