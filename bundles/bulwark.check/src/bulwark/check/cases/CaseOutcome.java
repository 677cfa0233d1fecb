package bulwark.check.cases;

import java.util.Map;

import bulwark.engine.solve.DcResult;

/**
 * A case and what solving it gave: a solution or a failure; for a surge, the energy each part absorbed over
 * the whole wave (joules by part name, on the first instant of the surge only, so it is counted once); for
 * a waveform case, on the outcome that stands for the cycle as a whole, each part's power averaged over the
 * steady cycle (watts by part name) and the cycle's solved points (null elsewhere).
 */
public record CaseOutcome(FaultCase faultCase, DcResult result, Map<String, Double> pulseEnergy,
		Map<String, Double> averagePower, SolvedCycle cycle) {
	public CaseOutcome {
		pulseEnergy = Map.copyOf(pulseEnergy);
		averagePower = Map.copyOf(averagePower);
	}

	public CaseOutcome(FaultCase faultCase, DcResult result, Map<String, Double> pulseEnergy) {
		this(faultCase, result, pulseEnergy, Map.of(), null);
	}

	public CaseOutcome(FaultCase faultCase, DcResult result) {
		this(faultCase, result, Map.of(), Map.of(), null);
	}

	/** The same outcome without its cycle's solutions, once what was wanted of them was taken. */
	public CaseOutcome withoutCycle() {
		return cycle == null ? this : new CaseOutcome(faultCase, result, pulseEnergy, averagePower, null);
	}
}
