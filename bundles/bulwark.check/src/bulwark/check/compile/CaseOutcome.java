package bulwark.check.compile;

import bulwark.engine.dc.DcResult;

import java.util.Map;

/**
 * A case and what solving it gave: a solution or a failure; for a surge, the energy each part absorbed over
 * the whole wave (joules by part name, on the first instant of the surge only, so it is counted once).
 */
public record CaseOutcome(FaultCase faultCase, DcResult result, Map<String, Double> pulseEnergy) {
	public CaseOutcome(FaultCase faultCase, DcResult result) {
		this(faultCase, result, Map.of());
	}
}
