package bulwark.engine.tests;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolver;

/** The contract for the operating point solved from a circuit. */
class OperatingPointContractTest extends SolverContract {
	@Override
	DcResult solve(Circuit circuit) {
		return new DcSolver().solve(circuit);
	}
}
