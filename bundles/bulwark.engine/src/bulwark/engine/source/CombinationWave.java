package bulwark.engine.source;

/**
 * The open-circuit voltage of the IEC 61000-4-5 combination wave generator, 1.2/50 µs:
 * v(t) = A·Vp·(1 − exp(−t/τ1))·exp(−t/τ2) with τ1 = 0.4074 µs, τ2 = 68.22 µs, A = 1.037 (IEC 61000-4-5:2014,
 * annex A, the formula of the 1.2/50 µs open-circuit voltage [unconfirmed: constants as recalled, checked by the
 * tests against the front time 1.2 µs ± 30 % and time to half value 50 µs ± 20 % of IEC 60060-1]).
 * The generator's effective source impedance (2 Ω, or 12 Ω line to earth) is the resistance it is placed
 * behind. Negative peaks give the other polarity.
 */
public record CombinationWave(double peakVolts, double startSeconds) implements Waveform {
	static final double TAU_FRONT = 0.4074e-6;
	static final double TAU_TAIL = 68.22e-6;
	static final double NORMALISATION = 1.037;

	@Override
	public double at(double seconds) {
		double t = seconds - startSeconds;
		if (t <= 0) {
			return 0;
		}
		return NORMALISATION * peakVolts * -Math.expm1(-t / TAU_FRONT) * Math.exp(-t / TAU_TAIL);
	}
}
