package bulwark.engine.device;

/**
 * Parameters of the bipolar transistor in the Ebers–Moll transport form (Ebers and Moll, "Large-signal
 * behavior of junction transistors", Proc. IRE 42, 1954; transport form as in Getreu, Modeling the Bipolar
 * Transistor, 1976), with reverse base–emitter breakdown added as an exponential knee like the diode's:
 * <pre>
 *   If = Is·(exp(vbe / (nf·Vt)) − 1)      Ir = Is·(exp(vbc / (nr·Vt)) − 1)
 *   Ic = If − Ir·(1 + 1/βR)               Ib = If/βF + Ir/βR − Ibv·exp(−(vbe + BVebo) / Vt)
 * </pre>
 * for an NPN; a PNP is the same with every voltage and current reversed. No Early effect and no ohmic
 * resistances at this level.
 *
 * @param saturationCurrent Is, A
 * @param forwardBeta βF
 * @param reverseBeta βR
 * @param forwardEmission nf
 * @param reverseEmission nr
 * @param emitterBaseBreakdown BVebo, V, positive (infinity for none)
 * @param breakdownCurrent Ibv, A, the emitter–base reverse current at BVebo
 * @param kelvin junction temperature, K
 */
public record BjtModel(double saturationCurrent, double forwardBeta, double reverseBeta, double forwardEmission,
		double reverseEmission, double emitterBaseBreakdown, double breakdownCurrent, double kelvin) {

	/**
	 * A generic small-signal silicon transistor: Is = 10 fA, βF = 100, βR = 1, BVebo = 6 V (reverse
	 * base–emitter breakdown of small-signal parts is about 5–6 V [common practice, docs/sources.md#semiconductor-inputs]).
	 */
	public static final BjtModel SMALL_SIGNAL = new BjtModel(1e-14, 100, 1, 1, 1, 6, 1e-3, Physics.DEFAULT_TEMPERATURE);

	public BjtModel {
		if (!(saturationCurrent > 0 && forwardBeta > 0 && reverseBeta > 0 && forwardEmission > 0
				&& reverseEmission > 0 && emitterBaseBreakdown > 0 && breakdownCurrent > 0 && kelvin > 0)) {
			throw new IllegalArgumentException("transistor parameters must be positive");
		}
	}

	public BjtModel withBeta(double forward) {
		return new BjtModel(saturationCurrent, forward, reverseBeta, forwardEmission, reverseEmission,
				emitterBaseBreakdown, breakdownCurrent, kelvin);
	}

	public BjtModel withoutBreakdown() {
		return new BjtModel(saturationCurrent, forwardBeta, reverseBeta, forwardEmission, reverseEmission,
				Double.POSITIVE_INFINITY, breakdownCurrent, kelvin);
	}

	public double thermalVoltage() {
		return Physics.thermalVoltage(kelvin);
	}
}
