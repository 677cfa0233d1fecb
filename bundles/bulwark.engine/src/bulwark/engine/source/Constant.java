package bulwark.engine.source;

/** A DC value. */
public record Constant(double value) implements Waveform {
	@Override
	public double at(double seconds) {
		return value;
	}
}
