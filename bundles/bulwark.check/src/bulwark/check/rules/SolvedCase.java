package bulwark.check.rules;

import bulwark.check.compile.FaultCase;
import bulwark.engine.dc.DcSolution;

import java.util.Map;

/** A case with its solved operating point; for a surge's first instant, the energy each part absorbed over the wave. */
public record SolvedCase(FaultCase faultCase, DcSolution solution, Map<String, Double> pulseEnergy) {
	public SolvedCase(FaultCase faultCase, DcSolution solution) {
		this(faultCase, solution, Map.of());
	}
}
