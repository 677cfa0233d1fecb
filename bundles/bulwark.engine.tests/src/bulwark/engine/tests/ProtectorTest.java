package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Protector;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.TransientResult;
import bulwark.engine.solve.TransientSolver;
import bulwark.engine.device.DiodeModel;
import bulwark.engine.device.ProtectorModel;
import bulwark.engine.source.Pulse;

/** The current-limiting protector: ohmic below its trip current, limiting above it, after its delay. */
class ProtectorTest {
	private static final ProtectorModel P = new ProtectorModel(10, 0.1, 1e-6); // 10 Ω, 100 mA, 1 µs

	private static Circuit circuit(double volts, double loadOhms) {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), out = b.net("out");
		b.add(new VoltageSource("V1", in, 0, Pulse.step(0, volts, 0, 1e-9), 0)).add(new Protector("F1", in, out, P))
				.add(new Resistor("RL", out, 0, loadOhms));
		return b.build();
	}

	@Test
	void ohmicBelowTrip() {
		// 1 V into 10 Ω + 1 kΩ: 0.99 mA, far below the trip current; tanh(x) ≈ x − x³/3, x ≈ 1e-4 [closed form]
		DcSolution s = (DcSolution) new DcSolver().solve(circuit(1, 1e3).withDevice(0,
				VoltageSource.ideal("V1", 1, 0, 1)));
		assertEquals(1 / 1010.0, s.device("F1").current(), 1e-9);
	}

	@Test
	void limitsAtMainsPeakAndTakesTheVoltage() {
		// 357.8 V into the protector and a 10 Ω load with a 5.1 V breakdown clamp: the current settles just
		// under 100 mA and the protector holds off nearly all of the voltage
		double peak = 253 * Math.sqrt(2);
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), out = b.net("out");
		b.add(VoltageSource.ideal("V1", in, 0, peak)).add(new Protector("F1", in, out, P))
				.add(new Resistor("RL", out, 0, 10));
		b.diode("Z1", 0, out, DiodeModel.SILICON.withBreakdown(5.1, 5e-3));
		DcSolution s = (DcSolution) new DcSolver().solve(b.build());
		double i = s.device("F1").current();
		assertTrue(i < 0.1 + 1e-9 && i > 0.0999, "limited current " + i); // GMIN adds 1 pS × 352 V
		assertTrue(s.device("F1").voltage() > peak - 6, "voltage across the protector " + s.device("F1").voltage());
	}

	@Test
	void passesUntilItsTripDelayRunsOut() {
		// 50 V step into 10 Ω + 100 Ω: 455 mA flows for the first microsecond, then the protector limits to 100 mA
		TransientResult r = new TransientSolver(new DcSolver()).run(DcSolver.prepare(circuit(50, 100)), 5e-6, 0.05e-6);
		assertTrue(r.completed(), () -> "stopped: " + r.failure());
		assertEquals(50 / 110.0, r.at(0.5e-6, s -> s.device("F1").current()), 1e-3);
		double later = r.at(3e-6, s -> s.device("F1").current());
		assertTrue(later < 0.1 + 1e-9 && later > 0.099, "limited after the delay: " + later);
	}
}
