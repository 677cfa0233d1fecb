package bulwark.engine.device;

/**
 * Parameters of the junction diode model: Shockley's law with emission coefficient, series resistance,
 * and reverse breakdown with its own knee.
 * <pre>
 *   I(v) = Is·(exp(v / (n·Vt)) − 1) − Ibv·exp(−(v + BV) / (nbv·Vt)) + GMIN·v      (v across the junction)
 * </pre>
 * Shockley, "The theory of p-n junctions in semiconductors", Bell Syst. Tech. J. 28, 1949; the breakdown
 * term is the exponential knee of Nagel's diode model (ERL memo M520, 1975). At v = −BV the reverse current is Ibv;
 * nbv sets how sharp the knee is. A zener is this model with its zener voltage as BV.
 *
 * @param saturationCurrent Is, A
 * @param emission n, dimensionless (1 for an ideal junction, about 2 for many LEDs)
 * @param seriesOhms Rs, Ω (0 for none)
 * @param breakdownVolts BV, V, positive; infinity for no breakdown
 * @param breakdownCurrent Ibv, A, the reverse current at v = −BV
 * @param breakdownEmission nbv, dimensionless
 * @param kelvin junction temperature, K
 */
public record DiodeModel(double saturationCurrent, double emission, double seriesOhms, double breakdownVolts,
		double breakdownCurrent, double breakdownEmission, double kelvin) {

	/**
	 * A generic small-signal silicon junction: Is = 10 fA, n = 1, no series resistance, no breakdown,
	 * 300 K. [unconfirmed: textbook-typical values, not a particular part]
	 */
	public static final DiodeModel SILICON = new DiodeModel(1e-14, 1, 0, Double.POSITIVE_INFINITY, 1e-3, 1,
			Physics.DEFAULT_TEMPERATURE);

	/** Current at which an LED's forward voltage is stated [common practice for indicator LEDs]. */
	public static final double LED_REFERENCE_CURRENT = 20e-3;

	/**
	 * An LED of emission coefficient n that drops {@code forwardVolts} at 20 mA: Is from
	 * If = Is·(exp(Vf/(n·Vt)) − 1).
	 */
	public static DiodeModel led(double forwardVolts, double emission) {
		double nvt = emission * Physics.thermalVoltage(Physics.DEFAULT_TEMPERATURE);
		return SILICON.withSaturation(LED_REFERENCE_CURRENT / Math.expm1(forwardVolts / nvt), emission);
	}

	public DiodeModel {
		if (!(saturationCurrent > 0) || !(emission > 0) || !(seriesOhms >= 0) || !(breakdownVolts > 0)
				|| !(breakdownCurrent > 0) || !(breakdownEmission > 0) || !(kelvin > 0)) {
			throw new IllegalArgumentException("diode parameters must be positive (series resistance may be 0)");
		}
	}

	public DiodeModel withSeriesOhms(double ohms) {
		return new DiodeModel(saturationCurrent, emission, ohms, breakdownVolts, breakdownCurrent, breakdownEmission,
				kelvin);
	}

	public DiodeModel withBreakdown(double volts, double amps) {
		return new DiodeModel(saturationCurrent, emission, seriesOhms, volts, amps, breakdownEmission, kelvin);
	}

	public DiodeModel withSaturation(double amps, double n) {
		return new DiodeModel(amps, n, seriesOhms, breakdownVolts, breakdownCurrent, breakdownEmission, kelvin);
	}

	public double thermalVoltage() {
		return Physics.thermalVoltage(kelvin);
	}

	/** Junction current at junction voltage v. */
	public double current(double v) {
		double nvt = emission * thermalVoltage();
		double i = saturationCurrent * (Junction.exp(v / nvt) - 1) + Junction.GMIN * v;
		if (Double.isFinite(breakdownVolts)) {
			i -= breakdownCurrent * Junction.exp(-(v + breakdownVolts) / (breakdownEmission * thermalVoltage()));
		}
		return i;
	}

	/** dI/dv at junction voltage v. */
	public double conductance(double v) {
		double nvt = emission * thermalVoltage();
		double g = saturationCurrent / nvt * Junction.expSlope(v / nvt) + Junction.GMIN;
		if (Double.isFinite(breakdownVolts)) {
			double bvt = breakdownEmission * thermalVoltage();
			g += breakdownCurrent / bvt * Junction.expSlope(-(v + breakdownVolts) / bvt);
		}
		return g;
	}

	/** Limits a Newton step of the junction voltage, on the forward side and, mirrored, in breakdown. */
	public double limit(double vNew, double vOld) {
		double nvt = emission * thermalVoltage();
		double v = Junction.limit(vNew, vOld, nvt, Junction.criticalVoltage(saturationCurrent, nvt));
		return Junction.limitBreakdown(v, vOld, breakdownVolts, breakdownEmission * thermalVoltage(), breakdownCurrent);
	}
}
