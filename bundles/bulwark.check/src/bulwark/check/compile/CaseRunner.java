package bulwark.check.compile;

import java.util.ArrayList;
import java.util.List;

import bulwark.engine.dc.DcSolver;

/** Solves a compiled design in each of its cases; the compiled circuit is shared, each case adds its devices. */
public final class CaseRunner {
	private CaseRunner() {
	}

	public static List<CaseOutcome> run(CompiledDesign design) {
		DcSolver solver = new DcSolver();
		List<CaseOutcome> outcomes = new ArrayList<>();
		for (FaultCase c : CaseGenerator.cases(design)) {
			outcomes.add(new CaseOutcome(c, solver.solve(design.circuit().plus(c.added()))));
		}
		return outcomes;
	}
}
