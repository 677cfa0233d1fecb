package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Capacitor;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Inductor;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.TransientResult;
import bulwark.engine.solve.TransientSolver;
import bulwark.engine.device.DiodeModel;
import bulwark.engine.source.CombinationWave;
import bulwark.engine.source.Pulse;

/** Transient analysis against closed forms and the published surge waveform parameters. */
class TransientTest {
	/** The error control keeps each step within 1e-3 relative; over a run the error stays of that order. */
	private static final double RELATIVE = 3e-3;

	private static TransientResult run(Circuit c, double stop, double maxStep) {
		TransientResult r = new TransientSolver(new DcSolver()).run(DcSolver.prepare(c), stop, maxStep);
		assertTrue(r.completed(), () -> "transient stopped: " + r.failure());
		return r;
	}

	@Test
	void resistorCapacitorStep() {
		// 5 V step through 1 kΩ into 1 µF: v(t) = 5·(1 − exp(−t/τ)), τ = 1 ms [closed form, first-order RC]
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), out = b.net("out");
		b.add(new VoltageSource("V1", in, 0, Pulse.step(0, 5, 10e-6, 1e-9), 0)).add(new Resistor("R1", in, out, 1e3))
				.add(new Capacitor("C1", out, 0, 1e-6));
		TransientResult r = run(b.build(), 6e-3, 50e-6);
		for (double tau : new double[] { 0.5, 1, 2, 5 }) {
			double t = 10e-6 + 1e-9 + tau * 1e-3;
			double expected = 5 * -Math.expm1(-tau);
			assertEquals(expected, r.at(t, s -> s.voltage("out")), 5 * RELATIVE, "at " + tau + " τ");
		}
		// the capacitor's current is the resistor's: (vin − vout)/R
		double t = 1.01e-3;
		assertEquals(r.at(t, s -> s.device("R1").current()), r.at(t, s -> s.device("C1").current()), 5e-3 * RELATIVE);
	}

	@Test
	void resistorInductorStep() {
		// 10 V step into 100 Ω and 10 mH: i(t) = 0.1·(1 − exp(−t·R/L)), L/R = 100 µs [closed form, first-order RL]
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), mid = b.net("mid");
		b.add(new VoltageSource("V1", in, 0, Pulse.step(0, 10, 1e-6, 1e-9), 0)).add(new Resistor("R1", in, mid, 100))
				.add(new Inductor("L1", mid, 0, 10e-3));
		TransientResult r = run(b.build(), 600e-6, 5e-6);
		for (double tau : new double[] { 1, 3 }) {
			double t = 1e-6 + 1e-9 + tau * 100e-6;
			assertEquals(0.1 * -Math.expm1(-tau), r.at(t, s -> s.device("L1").current()), 0.1 * RELATIVE, "at " + tau + " τ");
		}
	}

	@Test
	void combinationWaveHasTheStandardShape() {
		// IEC 61000-4-5 1.2/50 µs open-circuit voltage into 1 MΩ: front time T1 = 1.67·(t90 − t30) = 1.2 µs ± 30 %,
		// time to half value from the virtual origin 50 µs ± 20 % (IEC 60060-1 definitions) [published, docs/sources.md#mains-and-surges]
		Circuit.Builder b = Circuit.withReference("gnd");
		int g = b.net("gen"), out = b.net("out");
		b.add(new VoltageSource("SURGE", g, 0, new CombinationWave(1000, 1e-6), 0)).add(new Resistor("RS", g, out, 2))
				.add(new Resistor("RL", out, 0, 1e6));
		TransientResult r = run(b.build(), 150e-6, 0.05e-6);
		double peak = r.peak(s -> s.voltage("out"));
		assertEquals(1000, peak, 1000 * 0.01); // 2 Ω into 1 MΩ, and the normalisation puts the peak at Vp
		double t30 = crossing(r, 0.3 * peak, true), t90 = crossing(r, 0.9 * peak, true);
		double front = 1.67 * (t90 - t30);
		double origin = t30 - (t90 - t30) / 2; // the line through 30 % and 90 % meets zero here
		double half = crossing(r, 0.5 * peak, false) - origin;
		assertEquals(1.2e-6, front, 0.3 * 1.2e-6);
		assertEquals(50e-6, half, 0.2 * 50e-6);
	}

	@Test
	void fourKilovoltSurgeIntoAClampNetworkConverges() {
		// 4 kV combination wave behind 2 Ω and behind 12 Ω, both polarities, into 100 Ω and a 33 V breakdown
		// diode clamp: the run completes; the clamp holds the node a little above 33 V in breakdown, and at
		// a forward drop of about 0.9 V (39 A through a 10 fA junction: Vt·ln(39 A / 10 fA)) the other way
		for (double ohms : new double[] { 2, 12 }) {
			for (double sign : new double[] { 1, -1 }) {
				Circuit.Builder b = Circuit.withReference("gnd");
				int g = b.net("gen"), mid = b.net("mid"), node = b.net("node");
				b.add(new VoltageSource("SURGE", g, 0, new CombinationWave(sign * 4000, 0.5e-6), ohms))
						.add(new Resistor("R1", g, mid, 100)).add(new Resistor("RL", node, 0, 10e3))
						.add(new Resistor("RW", mid, node, 1));
				b.diode("D1", 0, node, DiodeModel.SILICON.withBreakdown(33, 1e-3));
				TransientResult r = run(b.build(), 100e-6, 0.2e-6);
				double extreme = sign > 0 ? r.peak(s -> s.voltage("node")) : -r.peak(s -> -s.voltage("node"));
				boolean held = sign > 0 ? extreme > 33 && extreme < 40 : extreme < -0.5 && extreme > -1.2;
				assertTrue(held, ohms + " Ω, polarity " + sign + ": " + extreme);
			}
		}
	}

	private static double crossing(TransientResult r, double level, boolean rising) {
		int start = 0;
		if (!rising) { // after the peak
			double best = Double.NEGATIVE_INFINITY;
			for (int i = 0; i < r.points().size(); i++) {
				double v = r.points().get(i).voltage("out");
				if (v > best) {
					best = v;
					start = i;
				}
			}
		}
		for (int i = start + 1; i < r.times().size(); i++) {
			double v0 = r.points().get(i - 1).voltage("out"), v1 = r.points().get(i).voltage("out");
			if (rising ? v0 < level && v1 >= level : v0 > level && v1 <= level) {
				double t0 = r.times().get(i - 1), t1 = r.times().get(i);
				return t0 + (level - v0) / (v1 - v0) * (t1 - t0);
			}
		}
		throw new AssertionError("the waveform never crosses " + level);
	}
}
