package bulwark.engine.device;

/**
 * The square-law MOSFET (Shichman and Hodges, "Modeling and simulation of insulated-gate field-effect
 * transistor switching circuits", IEEE J. Solid-State Circuits 3(3), 1968), for an n-channel device with
 * vgs, vds ≥ 0 (drain and source swap roles when vds < 0; a p-channel device mirrors every sign):
 * <pre>
 *   cut-off     vgs ≤ Vth:                 Id = 0
 *   triode      vds < vgs − Vth:           Id = β·((vgs − Vth)·vds − vds²/2)·(1 + λ·vds)
 *   saturation  vds ≥ vgs − Vth:           Id = (β/2)·(vgs − Vth)²·(1 + λ·vds)
 * </pre>
 * plus the body diode from source to drain (n-channel).
 *
 * @param threshold Vth, V (positive for an enhancement n-channel part, given as a magnitude for p-channel)
 * @param beta β = µCox·W/L, A/V²
 * @param lambda λ, channel-length modulation, 1/V
 * @param bodyDiode the source–drain body diode
 */
public record MosfetModel(double threshold, double beta, double lambda, DiodeModel bodyDiode) {
	/** A generic small-signal enhancement part: Vth 2 V, β 50 mA/V², λ 0.01/V. [unconfirmed: typical values] */
	public static final MosfetModel SMALL_SIGNAL = new MosfetModel(2, 50e-3, 0.01, DiodeModel.SILICON);

	public MosfetModel {
		if (!(threshold >= 0 && beta > 0 && lambda >= 0) || bodyDiode == null) {
			throw new IllegalArgumentException("MOSFET parameters must be positive");
		}
	}

	/** Drain current of the n-channel equivalent for vds ≥ 0. */
	public double drainCurrent(double vgs, double vds) {
		double overdrive = vgs - threshold;
		if (overdrive <= 0) {
			return 0;
		}
		double clm = 1 + lambda * vds;
		if (vds < overdrive) {
			return beta * (overdrive * vds - vds * vds / 2) * clm;
		}
		return beta / 2 * overdrive * overdrive * clm;
	}
}
