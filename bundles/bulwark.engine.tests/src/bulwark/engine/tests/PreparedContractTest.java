package bulwark.engine.tests;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.dc.DcResult;
import bulwark.engine.dc.DcSolver;
import bulwark.engine.dc.PreparedCircuit;

/** The contract for a prepared circuit solved twice, the second time from the first solution (continuation). */
class PreparedContractTest extends SolverContract {
	@Override
	DcResult solve(Circuit circuit) {
		DcSolver solver = new DcSolver();
		PreparedCircuit prepared = DcSolver.prepare(circuit);
		DcResult first = solver.solve(prepared);
		return first instanceof bulwark.engine.dc.DcSolution s ? solver.solve(prepared, s) : first;
	}
}
