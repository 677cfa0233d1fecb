package bulwark.engine.tests;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.PreparedCircuit;

/** The contract for a prepared circuit solved twice, the second time from the first solution (continuation). */
class PreparedContractTest extends SolverContract {
	@Override
	DcResult solve(Circuit circuit) {
		DcSolver solver = new DcSolver();
		PreparedCircuit prepared = DcSolver.prepare(circuit);
		DcResult first = solver.solve(prepared);
		return first instanceof bulwark.engine.solve.DcSolution s ? solver.solve(prepared, s) : first;
	}
}
