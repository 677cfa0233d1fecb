package bulwark.engine.device;

/**
 * A series current-limiting protector: low resistance below its trip current, and above it a current held
 * near the trip current while the voltage across it rises (up to its rated blocking voltage, which a rating
 * check compares). Static characteristic, smooth and monotonic so that Newton has one answer:
 * <pre>
 *   I(v) = It·tanh(v / (Ron·It))            (slope 1/Ron at 0, |I| → It for |v| ≫ Ron·It)
 * </pre>
 * In a transient the device lets current through at its on-resistance until the current has stayed above
 * the trip current for the trip delay. [Behavioural form of our own; real parts fold back further, which
 * this bounds from above: the current downstream parts see is at most It.]
 *
 * @param onOhms Ron, Ω
 * @param tripAmps It, A
 * @param tripSeconds the trip delay, s
 */
public record ProtectorModel(double onOhms, double tripAmps, double tripSeconds) {
	public ProtectorModel {
		if (!(onOhms > 0 && tripAmps > 0 && tripSeconds >= 0)) {
			throw new IllegalArgumentException("protector parameters must be positive");
		}
	}

	public double current(double v) {
		return tripAmps * Math.tanh(v / (onOhms * tripAmps));
	}

	public double conductance(double v) {
		double c = Math.cosh(Math.min(Math.abs(v / (onOhms * tripAmps)), 350));
		return 1 / (onOhms * c * c);
	}
}
