package bulwark.engine.tests;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.dc.DcResult;
import bulwark.engine.dc.DcSolver;
import bulwark.engine.dc.TransientResult;
import bulwark.engine.dc.TransientSolver;

/** The contract for a short transient of a circuit with constant sources: its last point, or why it stopped. */
class TransientContractTest extends SolverContract {
	@Override
	DcResult solve(Circuit circuit) {
		TransientResult r = new TransientSolver(new DcSolver()).run(DcSolver.prepare(circuit), 1e-6, 1e-7);
		return r.completed() ? r.points().get(r.points().size() - 1) : r.failure();
	}
}
