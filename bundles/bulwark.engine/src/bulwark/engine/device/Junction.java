package bulwark.engine.device;

/**
 * The arithmetic of a pn junction shared by diodes and transistors: the Shockley exponential with a
 * linear continuation past a large argument (so that no iterate overflows), and the junction-voltage
 * limiting (Nagel, ERL memo M520, 1975), which keeps Newton from leaping up the exponential.
 */
public final class Junction {
	/** Conductance across every junction (the customary minimum conductance, GMIN), so that no net hangs on a reverse-biased junction alone. */
	public static final double GMIN = 1e-12;
	/** Exponent beyond which exp() is continued by its tangent. */
	static final double MAX_EXPONENT = 80;

	private Junction() {
	}

	/** exp(x), continued linearly beyond {@link #MAX_EXPONENT}. */
	public static double exp(double x) {
		if (x <= MAX_EXPONENT) {
			return Math.exp(x);
		}
		return Math.exp(MAX_EXPONENT) * (1 + x - MAX_EXPONENT);
	}

	/** Derivative of {@link #exp(double)}. */
	public static double expSlope(double x) {
		return Math.exp(Math.min(x, MAX_EXPONENT));
	}

	/** Voltage above which limiting applies: the point of largest curvature, nVt·ln(nVt / (√2·Is)). */
	public static double criticalVoltage(double saturationCurrent, double nvt) {
		return nvt * Math.log(nvt / (Math.sqrt(2) * saturationCurrent));
	}

	/**
	 * Limits a new junction voltage against the previous one: above the critical voltage a step of more than
	 * two thermal voltages is replaced by the step the exponential's logarithm allows.
	 */
	public static double limit(double vNew, double vOld, double nvt, double vCritical) {
		if (vNew > vCritical && Math.abs(vNew - vOld) > 2 * nvt) {
			if (vOld > 0) {
				double arg = 1 + (vNew - vOld) / nvt;
				return arg > 0 ? vOld + nvt * Math.log(arg) : vCritical;
			}
			return nvt * Math.log(vNew / nvt);
		}
		return vNew;
	}

	/**
	 * Limits a step into reverse breakdown the same way, mirrored about −BV: the breakdown current
	 * Ibv·exp(−(v + BV)/(nbv·Vt)) is an exponential like the forward one. Applies only near or past −BV.
	 */
	public static double limitBreakdown(double vNew, double vOld, double breakdownVolts, double bvt,
			double breakdownCurrent) {
		if (!Double.isFinite(breakdownVolts) || vNew >= -breakdownVolts + 10 * bvt) {
			return vNew;
		}
		double mirrored = limit(-(vNew + breakdownVolts), -(vOld + breakdownVolts), bvt,
				criticalVoltage(breakdownCurrent, bvt));
		return -(mirrored + breakdownVolts);
	}
}
