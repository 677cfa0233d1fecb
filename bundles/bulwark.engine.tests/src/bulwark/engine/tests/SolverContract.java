package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.SolveFailure;
import bulwark.engine.solve.SolveFailure.Reason;
import bulwark.engine.device.DiodeModel;

/**
 * What every way of solving a circuit must do: name structural faults, never throw, and stay accurate over
 * resistances from 1 pΩ to 1 TΩ. Each solver path extends this with its own {@link #solve}.
 */
abstract class SolverContract {
	/** Solves the circuit the way this path does and returns its final point or its failure. */
	abstract DcResult solve(Circuit circuit);

	private static Circuit divider(double top, double bottom) {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), out = b.net("out");
		return b.add(VoltageSource.ideal("V1", in, 0, 10)).add(new Resistor("RT", in, out, top))
				.add(new Resistor("RB", out, 0, bottom)).build();
	}

	@Test
	void extremeResistances() {
		double[] values = { 1e-12, 1e-6, 1, 1e6, 1e12 };
		for (double top : values) {
			for (double bottom : values) {
				DcResult r = solve(divider(top, bottom));
				DcSolution s = assertInstanceOf(DcSolution.class, r, () -> top + " over " + bottom + ": " + r);
				double expected = 10 * bottom / (top + bottom); // divider [closed form]
				assertEquals(expected, s.voltage("out"), 1e-9 * 10, top + " over " + bottom);
			}
		}
	}

	@Test
	void floatingNetIsNamed() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), x = b.net("x"), y = b.net("y");
		b.add(VoltageSource.ideal("V1", in, 0, 1)).add(new Resistor("R1", in, 0, 1)).add(new Resistor("R2", x, y, 1));
		SolveFailure f = assertInstanceOf(SolveFailure.class, solve(b.build()));
		assertEquals(Reason.FLOATING_NET, f.reason());
		assertEquals("x", f.place());
	}

	@Test
	void sourceLoopIsNamed() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int a = b.net("a");
		b.add(VoltageSource.ideal("V1", a, 0, 1)).add(new Resistor("R1", a, 0, 1)).add(VoltageSource.ideal("V2", 0, a, 2));
		SolveFailure f = assertInstanceOf(SolveFailure.class, solve(b.build()));
		assertEquals(Reason.VOLTAGE_SOURCE_LOOP, f.reason());
		assertEquals("V2", f.place());
	}

	@Test
	void nearlyFloatingNetStillSolves() {
		// a net held only by 1 TΩ and a reverse-biased diode: defined, if barely; the divider gives its voltage
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), n = b.net("n");
		b.add(VoltageSource.ideal("V1", in, 0, 5)).add(new Resistor("RH", in, n, 1e12));
		b.diode("D1", 0, n, DiodeModel.SILICON);
		DcSolution s = assertInstanceOf(DcSolution.class, solve(b.build()));
		double v = s.voltage("n");
		// reverse current of the diode is Is + GMIN·v: (5 − v)/1 TΩ = 1e-14 + 1e-12·v [closed form]
		assertEquals((5 - 1e-2) / (1 + 1), v, 0.01); // v = (5 − 1e-14·1e12)/(1 + 1e-12·1e12)
	}

	@Test
	void equationsWithoutASolutionAreNoConvergence() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), n = b.net("n");
		b.add(VoltageSource.ideal("V1", in, 0, 5)).add(new Resistor("R1", in, 0, 1e3));
		b.add(UnsolvableDevices.noSolution("X1", n, 0));
		SolveFailure f = assertInstanceOf(SolveFailure.class, solve(b.build()));
		assertEquals(Reason.NO_CONVERGENCE, f.reason(), f::message);
		assertEquals("n", f.place(), f::message);
	}

	@Test
	void emptyEquationIsASingularMatrixAtItsNet() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), n = b.net("n");
		b.add(VoltageSource.ideal("V1", in, 0, 5)).add(new Resistor("R1", in, 0, 1e3));
		b.add(UnsolvableDevices.claimsAPathButStampsNothing("X1", n, 0));
		SolveFailure f = assertInstanceOf(SolveFailure.class, solve(b.build()));
		assertEquals(Reason.SINGULAR_MATRIX, f.reason(), f::message);
		assertEquals("n", f.place(), f::message);
	}

	@Test
	void emptyCircuitIsAFailure() {
		assertEquals(Reason.EMPTY_CIRCUIT,
				assertInstanceOf(SolveFailure.class, solve(Circuit.withReference("gnd").build())).reason());
	}
}
