package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.TransientResult;
import bulwark.engine.solve.TransientSolver;
import bulwark.engine.solve.SolveFailure.Reason;

/** The contract for a short transient of a circuit with constant sources: its last point, or why it stopped. */
class TransientContractTest extends SolverContract {
	@Override
	DcResult solve(Circuit circuit) {
		TransientResult r = new TransientSolver(new DcSolver()).run(DcSolver.prepare(circuit), 1e-6, 1e-7);
		return r.completed() ? r.points().get(r.points().size() - 1) : r.failure();
	}

	@Test
	void equationsThatLoseTheirSolutionMidRunStopTheTransient() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), n = b.net("n");
		b.add(VoltageSource.ideal("V1", in, 0, 5)).add(new Resistor("R1", in, 0, 1e3));
		b.add(UnsolvableDevices.noSolution("X1", n, 0.5e-6));
		TransientResult r = new TransientSolver(new DcSolver()).run(DcSolver.prepare(b.build()), 1e-6, 1e-7);
		assertFalse(r.completed());
		assertEquals(Reason.TIMESTEP_TOO_SMALL, r.failure().reason(), r.failure()::message);
		assertEquals("n", r.failure().place());
		double last = r.times().get(r.times().size() - 1);
		assertTrue(last > 0.3e-6 && last < 0.5e-6, "the run got as far as the equations allowed, stopped at " + last);
	}
}
