package bulwark.engine.source;

/**
 * A sine switched on at its crest: 0 up to t = 0, then amplitude·cos(2π·f·t). The operating point at t = 0 is
 * the circuit at rest; the first step meets the whole crest, as a switch closing onto mains at its peak does —
 * the instant that charges capacitors hardest.
 */
public record SwitchedSine(double amplitude, double hertz) implements Waveform {
	@Override
	public double at(double seconds) {
		return seconds <= 0 ? 0 : amplitude * Math.cos(2 * Math.PI * hertz * seconds);
	}

	/** One period, s. */
	public double period() {
		return 1 / hertz;
	}
}
