package bulwark.check.function;

/**
 * What a bisected switching point can tell: each is found to within {@code relative} of its value, so two
 * that differ by less than both widths together are the same point as far as the sweep can say. Their
 * difference then is the bisection's own width — femto-ohms of "hysteresis" — and is reported as none.
 */
final class Resolution {
	private Resolution() {
	}

	/** |a − b|, or 0 when that is within the resolution of the two figures [closed form: bisection width]. */
	static double beyond(double a, double b, double relative) {
		double difference = Math.abs(a - b);
		return difference <= relative * (Math.abs(a) + Math.abs(b)) ? 0 : difference;
	}
}
