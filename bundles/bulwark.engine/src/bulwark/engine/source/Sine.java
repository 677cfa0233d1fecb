package bulwark.engine.source;

/** offset + amplitude·sin(2π·f·t + phase); mains at 230 V is amplitude 325.27 V, f = 50 Hz. */
public record Sine(double offset, double amplitude, double hertz, double phaseRadians) implements Waveform {
	@Override
	public double at(double seconds) {
		return offset + amplitude * Math.sin(2 * Math.PI * hertz * seconds + phaseRadians);
	}
}
