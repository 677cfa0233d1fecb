package bulwark.engine.tests;

import static bulwark.engine.tests.Tolerances.rel;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.CurrentSource;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;

/** Linear networks against closed-form values (docs/sources.md#solver-oracles). */
class LinearDcSolverTest {

	private static DcSolution solve(Circuit c) {
		DcResult r = new DcSolver().solve(c);
		return assertInstanceOf(DcSolution.class, r, () -> "expected a solution, got " + r);
	}

	@Test
	void dividerOutputAndTheveninResistance() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), out = b.net("out");
		b.add(VoltageSource.ideal("V1", in, 0, 12)).add(new Resistor("R1", in, out, 10e3))
				.add(new Resistor("R2", out, 0, 20e3));
		DcSolution open = solve(b.build());
		// Divider 12 V, 10 k over 20 k: 12·20/30 = 8 V [closed form, docs/sources.md#solver-oracles]
		double expectedV = 12.0 * 20e3 / (10e3 + 20e3);
		assertEquals(expectedV, open.voltage("out"), rel(expectedV));

		// Thevenin resistance = Voc / Isc, with a 0 V ideal source shorting the output: 10k‖20k = 6666.67 Ω
		b.add(VoltageSource.ideal("SHORT", out, 0, 0));
		DcSolution shorted = solve(b.build());
		double isc = shorted.device("SHORT").current();
		double expectedRth = 10e3 * 20e3 / (10e3 + 20e3);
		assertEquals(expectedRth, open.voltage("out") / isc, rel(expectedRth) * 10);
	}

	@Test
	void unbalancedWheatstoneBridge() {
		// 10 V; arms 1 k/1 k and 1 k (top)/1.1 k (bottom): Vth = 5/21 V, Rth = 1023.8095 Ω,
		// 100 Ω detector current 1/4720 A [closed form: Thevenin equivalent of the bridge]
		Circuit.Builder b = Circuit.withReference("gnd");
		int top = b.net("top"), left = b.net("left"), right = b.net("right");
		b.add(VoltageSource.ideal("V1", top, 0, 10)).add(new Resistor("R1", top, left, 1e3))
				.add(new Resistor("R2", left, 0, 1e3)).add(new Resistor("R3", top, right, 1e3))
				.add(new Resistor("R4", right, 0, 1.1e3));
		Circuit bridge = b.build();
		DcSolution open = solve(bridge);
		double vth = open.voltage("right") - open.voltage("left");
		assertEquals(5.0 / 21.0, vth, rel(5.0 / 21.0) * 10);

		DcSolution loaded = solve(bridge.plus(java.util.List.of(new Resistor("RD", right, left, 100))));
		// (5/21 V) / (500 Ω + 1100/2.1 Ω + 100 Ω) = (5/21) / (23600/21) = 1/4720 A, worked by hand
		double expectedI = 1.0 / 4720.0;
		assertEquals(expectedI, loaded.device("RD").current(), rel(expectedI) * 10);
	}

	@Test
	void batteryInternalResistanceDropsTerminalVoltage() {
		// Thevenin source: I = E / (r + R), V = E·R / (r + R) [closed form, Ohm's law]
		Circuit.Builder b = Circuit.withReference("gnd");
		int plus = b.net("plus");
		b.add(new VoltageSource("B1", plus, 0, 3.0, 10)).add(new Resistor("RL", plus, 0, 90));
		DcSolution s = solve(b.build());
		assertEquals(3.0 * 90 / 100, s.voltage("plus"), rel(2.7));
		assertEquals(-0.03, s.device("B1").current(), rel(0.03)); // delivering: current leaves the plus pin
		assertEquals(-0.03 * 2.7, s.device("B1").power(), rel(0.081)); // absorbed power negative
		assertEquals(0.03 * 0.03 * 90, s.device("RL").power(), rel(0.081));
	}

	@Test
	void currentSourceIntoResistor() {
		// V = I·R [closed form]; source pushes 2 mA from gnd through itself into net n
		Circuit.Builder b = Circuit.withReference("gnd");
		int n = b.net("n");
		b.add(new CurrentSource("I1", 0, n, 2e-3)).add(new Resistor("R1", n, 0, 4.7e3));
		assertEquals(2e-3 * 4.7e3, solve(b.build()).voltage("n"), rel(9.4));
	}
}
