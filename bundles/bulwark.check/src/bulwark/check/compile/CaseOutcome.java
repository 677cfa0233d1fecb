package bulwark.check.compile;

import java.util.Map;

import bulwark.engine.dc.DcResult;

/**
 * A case and what solving it gave: a solution or a failure; for a surge, the energy each part absorbed over
 * the whole wave (joules by part name, on the first instant of the surge only, so it is counted once); for
 * mains, each part's power averaged over the steady cycle (watts by part name, on one instant only).
 */
public record CaseOutcome(FaultCase faultCase, DcResult result, Map<String, Double> pulseEnergy,
		Map<String, Double> averagePower) {
	public CaseOutcome {
		pulseEnergy = Map.copyOf(pulseEnergy);
		averagePower = Map.copyOf(averagePower);
	}

	public CaseOutcome(FaultCase faultCase, DcResult result, Map<String, Double> pulseEnergy) {
		this(faultCase, result, pulseEnergy, Map.of());
	}

	public CaseOutcome(FaultCase faultCase, DcResult result) {
		this(faultCase, result, Map.of(), Map.of());
	}
}
