package bulwark.check.cases;

import java.util.Map;

import bulwark.engine.solve.DcSolution;

/**
 * A case with its solved operating point; for a surge's first instant, the energy each part absorbed over the
 * wave; for one instant of a mains case, each part's power averaged over the steady cycle.
 */
public record SolvedCase(FaultCase faultCase, DcSolution solution, Map<String, Double> pulseEnergy,
		Map<String, Double> averagePower) {
	public SolvedCase(FaultCase faultCase, DcSolution solution) {
		this(faultCase, solution, Map.of(), Map.of());
	}
}
