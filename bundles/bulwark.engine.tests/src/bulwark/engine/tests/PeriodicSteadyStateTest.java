package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Capacitor;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.PeriodicSteadyState;
import bulwark.engine.solve.PreparedCircuit;
import bulwark.engine.solve.SolveFailure.Reason;
import bulwark.engine.solve.TransientResult;
import bulwark.engine.solve.TransientSolver;
import bulwark.engine.source.SwitchedSine;

/** Runs in pieces and the periodic steady state, against the closed forms of a series RC under a sine. */
class PeriodicSteadyStateTest {
	private static final double HZ = 50, PERIOD = 1 / HZ, PEAK = 100, R = 1e3, C = 1e-6;

	private static PreparedCircuit seriesRc(double leakageOhms) {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), mid = b.net("mid");
		b.add(new VoltageSource("V1", in, 0, new SwitchedSine(PEAK, HZ), 0)).add(new Resistor("R1", in, mid, R))
				.add(new Capacitor("C1", mid, 0, C, leakageOhms));
		return DcSolver.prepare(b.build());
	}

	@Test
	void theSteadyStateHasThePhasorAmplitude() {
		PreparedCircuit rc = seriesRc(Double.POSITIVE_INFINITY);
		TransientSolver transients = new TransientSolver(new DcSolver());
		TransientResult on = transients.run(rc, PERIOD, PERIOD / 100);
		assertTrue(on.completed(), () -> on.failure().message());
		PeriodicSteadyState.Result r = new PeriodicSteadyState(transients).run(rc, on, PERIOD, PERIOD / 100, 50);
		assertTrue(r.settled(), () -> r.failure().message());
		// |V_C| = Vp/√(1 + (ωRC)²) with ωRC = 0.31416: 95.40 V [closed form, steady-state phasors]
		double omegaRc = 2 * Math.PI * HZ * R * C;
		double expected = PEAK / Math.sqrt(1 + omegaRc * omegaRc);
		double peak = r.period().peak(s -> Math.abs(s.voltage("mid")));
		assertEquals(expected, peak, 0.005 * expected);
		// τ = RC = 1 ms against a 20 ms period: settled within a few periods
		assertTrue(r.periods() <= 5, "periods " + r.periods());
	}

	@Test
	void aRunInTwoPiecesFollowsTheRunInOne() {
		PreparedCircuit rc = seriesRc(Double.POSITIVE_INFINITY);
		TransientSolver transients = new TransientSolver(new DcSolver());
		TransientResult whole = transients.run(rc, 2 * PERIOD, PERIOD / 100);
		TransientResult first = transients.run(rc, PERIOD, PERIOD / 100);
		TransientResult second = transients.continueFrom(rc, first, 2 * PERIOD, PERIOD / 100);
		assertTrue(whole.completed() && first.completed() && second.completed());
		assertEquals(PERIOD, second.times().get(0), 0);
		assertEquals(2 * PERIOD, second.times().get(second.times().size() - 1), 1e-12);
		// restarted by a backward-Euler step, the state carries over: within 1 % of the crest
		assertEquals(whole.at(2 * PERIOD, s -> s.voltage("mid")), second.at(2 * PERIOD, s -> s.voltage("mid")),
				0.01 * PEAK);
	}

	@Test
	void aLeakyCapacitorHoldsItsNetAtDc() {
		// without leakage mid has no DC path; with 1 GΩ across each capacitor the operating point exists
		assertEquals(Reason.FLOATING_NET, assertInstanceOf(bulwark.engine.solve.SolveFailure.class,
				new DcSolver().solve(divider(Double.POSITIVE_INFINITY))).reason());
		DcSolution s = assertInstanceOf(DcSolution.class, new DcSolver().solve(divider(1e9)));
		// equal leakages divide the 10 V: 5 V, and 10 V/2 GΩ = 5 nA through both [closed form, divider]
		assertEquals(5, s.voltage("mid"), 1e-6);
		assertEquals(5e-9, Math.abs(s.device("C1").current()), 1e-15);
	}

	/** Two capacitors in series across 10 V, each with the given leakage. */
	private static Circuit divider(double leakageOhms) {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), mid = b.net("mid");
		b.add(VoltageSource.ideal("V1", in, 0, 10)).add(new Capacitor("C1", in, mid, C, leakageOhms))
				.add(new Capacitor("C2", mid, 0, C, leakageOhms));
		return b.build();
	}
}
