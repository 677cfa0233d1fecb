package bulwark.engine.source;

/** The value of an independent source over time (volts or amperes). */
public interface Waveform {
	double at(double seconds);

	static Waveform constant(double value) {
		return new Constant(value);
	}
}
