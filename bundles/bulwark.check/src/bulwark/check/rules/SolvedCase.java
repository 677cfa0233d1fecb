package bulwark.check.rules;

import java.util.Map;

import bulwark.check.compile.FaultCase;
import bulwark.engine.dc.DcSolution;

/**
 * A case with its solved operating point; for a surge's first instant, the energy each part absorbed over the
 * wave; for one instant of a mains case, each part's power averaged over the steady cycle.
 */
public record SolvedCase(FaultCase faultCase, DcSolution solution, Map<String, Double> pulseEnergy,
		Map<String, Double> averagePower) {
	public SolvedCase(FaultCase faultCase, DcSolution solution) {
		this(faultCase, solution, Map.of(), Map.of());
	}

	/** The figure a stress is judged on in this case for the part, NaN when this case does not judge it. */
	public double figure(bulwark.check.stress.Measure measure, String part) {
		return measure.judged(faultCase, solution.device(part), averagePower, part);
	}
}
