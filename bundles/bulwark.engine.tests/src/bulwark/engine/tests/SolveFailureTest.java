package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Comparator;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.SolveFailure;
import bulwark.engine.solve.SolveFailure.Reason;
import bulwark.engine.device.ComparatorModel;

/**
 * Circuits that cannot be solved end in a failure naming reason and place, never in an exception. The reasons
 * that need an unsolvable device (no convergence, singular matrix, time step too small) are in
 * {@link SolverContract} and {@link TransientContractTest}, through the production solver.
 */
class SolveFailureTest {

	@Test
	void floatingNetIsNamed() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), island = b.net("island"), other = b.net("other");
		b.add(VoltageSource.ideal("V1", in, 0, 5)).add(new Resistor("R1", in, 0, 1e3))
				.add(new Resistor("R2", island, other, 1e3));
		SolveFailure f = assertInstanceOf(SolveFailure.class, new DcSolver().solve(b.build()));
		assertEquals(Reason.FLOATING_NET, f.reason());
		assertEquals("island", f.place());
		assertTrue(f.message().contains("island, other"), f.message());
	}

	@Test
	void loopOfIdealSourcesIsNamed() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int a = b.net("a");
		b.add(VoltageSource.ideal("V1", a, 0, 5)).add(VoltageSource.ideal("V2", a, 0, 3));
		SolveFailure f = assertInstanceOf(SolveFailure.class, new DcSolver().solve(b.build()));
		assertEquals(Reason.VOLTAGE_SOURCE_LOOP, f.reason());
		assertEquals("V2", f.place());
	}

	@Test
	void sourcesWithInternalResistanceInParallelAreFine() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int a = b.net("a");
		b.add(new VoltageSource("B1", a, 0, 3, 1)).add(new VoltageSource("B2", a, 0, 1, 1));
		// Two Thevenin sources in parallel settle at the mean EMF for equal resistances [closed form]
		assertEquals(2.0, ((bulwark.engine.solve.DcSolution) new DcSolver().solve(b.build())).voltage("a"), 1e-12);
	}

	@Test
	void emptyCircuit() {
		assertEquals(Reason.EMPTY_CIRCUIT,
				assertInstanceOf(SolveFailure.class, new DcSolver().solve(Circuit.withReference("gnd").build()))
						.reason());
	}

	@Test
	void aComparatorInputHeldOnlyByItsLeakageIsNamed() {
		// in+ reaches nothing but a resistor to an open net: picoamperes of clamp leakage set its voltage, which
		// the comparator's gain turns into an undefined output; the failure names the input and what holds it
		Circuit.Builder b = Circuit.withReference("gnd");
		int vcc = b.net("vcc"), ref = b.net("ref"), inp = b.net("inp"), open = b.net("open"), out = b.net("out");
		b.add(VoltageSource.ideal("VCC", vcc, 0, 5)).add(VoltageSource.ideal("VREF", ref, 0, 2.5))
				.add(new Resistor("RIN", open, inp, 100e3)).add(new Resistor("RL", out, 0, 10e3))
				.add(new Comparator("U1", inp, ref, out, vcc, 0, ComparatorModel.GENERIC));
		SolveFailure f = assertInstanceOf(SolveFailure.class, new DcSolver().solve(b.build()));
		assertEquals(Reason.FLOATING_NET, f.reason(), f.message());
		assertEquals("inp", f.place());
		assertTrue(f.message().startsWith("net inp, open is held only by the input leakage of U1"), f.message());
		// held by a megohm instead, it solves: the input sits at 0 V, below the 2.5 V reference
		Circuit.Builder held = Circuit.withReference("gnd");
		int vcc2 = held.net("vcc"), ref2 = held.net("ref"), inp2 = held.net("inp"), out2 = held.net("out");
		held.add(VoltageSource.ideal("VCC", vcc2, 0, 5)).add(VoltageSource.ideal("VREF", ref2, 0, 2.5))
				.add(new Resistor("RPD", inp2, 0, 1e6)).add(new Resistor("RL", out2, 0, 10e3))
				.add(new Comparator("U1", inp2, ref2, out2, vcc2, 0, ComparatorModel.GENERIC));
		DcSolution s = assertInstanceOf(DcSolution.class, new DcSolver().solve(held.build()));
		assertEquals(0, s.voltage("inp"), 1e-3);
		assertTrue(s.voltage("out") < 0.1, "output low: " + s.voltage("out"));
	}

	@Test
	void dcSolutionKeepsDeviceOrder() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int a = b.net("a");
		b.add(VoltageSource.ideal("V1", a, 0, 1)).add(new Resistor("R9", a, 0, 1)).add(new Resistor("R1", a, 0, 1));
		var s = (bulwark.engine.solve.DcSolution) new DcSolver().solve(b.build());
		assertEquals(List.of("V1", "R9", "R1"), List.copyOf(s.devices().keySet()));
	}
}
