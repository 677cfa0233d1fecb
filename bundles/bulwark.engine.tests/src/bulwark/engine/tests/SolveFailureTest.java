package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.dc.DcSolver;
import bulwark.engine.dc.SolveFailure;
import bulwark.engine.dc.SolveFailure.Reason;

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
		assertEquals(2.0, ((bulwark.engine.dc.DcSolution) new DcSolver().solve(b.build())).voltage("a"), 1e-12);
	}

	@Test
	void emptyCircuit() {
		assertEquals(Reason.EMPTY_CIRCUIT,
				assertInstanceOf(SolveFailure.class, new DcSolver().solve(Circuit.withReference("gnd").build()))
						.reason());
	}

	@Test
	void dcSolutionKeepsDeviceOrder() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int a = b.net("a");
		b.add(VoltageSource.ideal("V1", a, 0, 1)).add(new Resistor("R9", a, 0, 1)).add(new Resistor("R1", a, 0, 1));
		var s = (bulwark.engine.dc.DcSolution) new DcSolver().solve(b.build());
		assertEquals(List.of("V1", "R9", "R1"), List.copyOf(s.devices().keySet()));
	}
}
