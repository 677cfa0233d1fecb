package bulwark.engine.tests;

/**
 * The principal branch W0 of the Lambert W function for positive arguments given by their logarithm,
 * so that arguments like e^170 do not overflow: solves w + ln w = ln x by Newton's method
 * (Corless et al., "On the Lambert W function", Adv. Comput. Math. 5, 1996, §4). Independent of the engine.
 */
final class LambertW {
	private LambertW() {
	}

	/** W0(x) for x = e^logX, x > 0. */
	static double ofLog(double logX) {
		double w = logX > 1 ? logX - Math.log(logX) : Math.exp(logX) / (1 + Math.exp(logX)) + 0.5;
		for (int i = 0; i < 100; i++) {
			double f = w + Math.log(w) - logX;
			double step = f / (1 + 1 / w);
			w -= step;
			if (w <= 0) {
				w = 1e-300;
			}
			if (Math.abs(step) <= 1e-16 * Math.max(1, w)) {
				break;
			}
		}
		return w;
	}

	/**
	 * Current through a Shockley diode (Is, n·Vt) in series with R across a voltage V, exact:
	 * I = (nVt/R)·W0((Is·R/nVt)·exp((V + Is·R)/nVt)) − Is (Banwell and Jayakumar, "Exact analytical solution
	 * for current flow through diode with series resistance", Electronics Letters 36(4), 2000).
	 */
	static double diodeCurrent(double volts, double ohms, double is, double nvt) {
		double logArg = Math.log(is * ohms / nvt) + (volts + is * ohms) / nvt;
		return nvt / ohms * ofLog(logArg) - is;
	}
}
