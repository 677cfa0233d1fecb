package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Bjt;
import bulwark.engine.circuit.Bjt.Polarity;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.OperatingPoint;
import bulwark.engine.device.BjtModel;
import bulwark.engine.device.Physics;

/** Transistor circuits against closed forms (docs/sources.md#solver-oracles, "Four-resistor BJT bias"). */
class BjtTest {
	/**
	 * The model keeps GMIN = 1 pS across each junction (common practice in circuit solvers); across the reverse-biased
	 * collector junction (−4 V) it adds about 4 pA of base current, which moves IC by 3e-8 relative.
	 */
	private static final double RELATIVE = 1e-7;

	private static DcSolution solve(Circuit c) {
		DcResult r = new DcSolver().solve(c);
		return assertInstanceOf(DcSolution.class, r, () -> "expected a solution, got " + r);
	}

	/** VCC 15 V, 100 k / 50 k divider, RE 3 k, RC 5 k, β 100, for either polarity (PNP mirrored). */
	private static DcSolution biasCircuit(Polarity polarity, BjtModel model) {
		double s = polarity == Polarity.NPN ? 1 : -1;
		Circuit.Builder b = Circuit.withReference("gnd");
		int vcc = b.net("vcc"), base = b.net("base"), col = b.net("collector"), emi = b.net("emitter");
		b.add(VoltageSource.ideal("VCC", vcc, 0, s * 15)).add(new Resistor("R1", vcc, base, 100e3))
				.add(new Resistor("R2", base, 0, 50e3)).add(new Resistor("RC", vcc, col, 5e3))
				.add(new Resistor("RE", emi, 0, 3e3)).add(new Bjt("Q1", col, base, emi, polarity, model));
		return solve(b.build());
	}

	/**
	 * The bias point in closed form, solved here by bisection on VBE: Thevenin base source VBB = 5 V,
	 * RBB = 33.3 kΩ; VBB = IB·RBB + VBE + IE·RE with IC = Is·(exp(VBE/VT) − 1), IB = IC/β, IE = IC + IB.
	 */
	private static double collectorCurrent(double beta) {
		double vt = Physics.thermalVoltage(300);
		double vbb = 15 * 50e3 / 150e3, rbb = 100e3 * 50e3 / 150e3;
		double lo = 0, hi = 1;
		for (int i = 0; i < 200; i++) {
			double vbe = (lo + hi) / 2;
			double ic = 1e-14 * Math.expm1(vbe / vt);
			double f = vbb - ic / beta * rbb - vbe - ic * (1 + 1 / beta) * 3e3;
			if (f > 0) {
				lo = vbe;
			} else {
				hi = vbe;
			}
		}
		return 1e-14 * Math.expm1(lo / vt);
	}

	@Test
	void fourResistorBiasPoint() {
		// IC = 1.289978207 mA, VBE = 0.6613732965 V with Is = 1e-14 A, VT(300 K), αF = 100/101, no Early
		// effect [closed form, docs/sources.md#solver-oracles]; VC = 15 − IC·RC
		double ic = collectorCurrent(100);
		assertEquals(1.289978207e-3, ic, 1e-12);
		DcSolution s = biasCircuit(Polarity.NPN, BjtModel.SMALL_SIGNAL);
		OperatingPoint q = s.device("Q1");
		assertEquals(ic, q.pinCurrent("collector"), ic * RELATIVE);
		assertEquals(0.6613732965, s.voltage("base") - s.voltage("emitter"), 1e-8 + 0.0259 * RELATIVE);
		assertEquals(15 - ic * 5e3, s.voltage("collector"), 1e-6);
		assertEquals(ic / 100, q.pinCurrent("base"), ic / 100 * 1e-6);
		assertEquals(0, q.pinCurrent("collector") + q.pinCurrent("base") + q.pinCurrent("emitter"), 1e-15);
	}

	@Test
	void pnpMirrorsNpn() {
		DcSolution npn = biasCircuit(Polarity.NPN, BjtModel.SMALL_SIGNAL);
		DcSolution pnp = biasCircuit(Polarity.PNP, BjtModel.SMALL_SIGNAL);
		assertEquals(npn.voltage("collector"), -pnp.voltage("collector"), 1e-9);
		assertEquals(npn.device("Q1").pinCurrent("collector"), -pnp.device("Q1").pinCurrent("collector"), 1e-14);
	}

	@Test
	void reverseBaseEmitterBreakdownClampsAtBvebo() {
		// Emitter driven 12 V above a grounded base through 10 kΩ: the base–emitter junction breaks down at
		// BVebo = 6 V plus Vt·ln(I/Ibv) [closed form of the breakdown term]; the collector is left open
		// through 1 MΩ to the reference.
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), emi = b.net("emitter"), col = b.net("collector");
		b.add(VoltageSource.ideal("V1", in, 0, 12)).add(new Resistor("R1", in, emi, 10e3))
				.add(new Resistor("RC", col, 0, 1e6)).add(new Bjt("Q1", col, 0, emi, Polarity.NPN, BjtModel.SMALL_SIGNAL));
		DcSolution s = solve(b.build());
		double veb = s.voltage("emitter");
		assertEquals(veb, s.device("Q1").reverseVoltage("base-emitter"), 0); // base on the reference
		double current = (12 - veb) / 10e3;
		assertTrue(current > 5e-4, "breakdown current " + current);
		assertEquals(6 + Physics.thermalVoltage(300) * Math.log(current / 1e-3), veb, 1e-3);
	}

	@Test
	void saturatedSwitchConverges() {
		// 5 V into the base through 1 kΩ, 1 kΩ collector load from 5 V: hard saturation, both junctions forward
		Circuit.Builder b = Circuit.withReference("gnd");
		int vcc = b.net("vcc"), base = b.net("base"), col = b.net("collector");
		b.add(VoltageSource.ideal("VCC", vcc, 0, 5)).add(new Resistor("RB", vcc, base, 1e3))
				.add(new Resistor("RC", vcc, col, 1e3)).add(new Bjt("Q1", col, base, 0, Polarity.NPN, BjtModel.SMALL_SIGNAL));
		DcSolution s = solve(b.build());
		double vce = s.voltage("collector");
		assertTrue(vce > 0 && vce < 0.2, "saturation voltage " + vce);
	}
}
