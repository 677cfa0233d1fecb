package bulwark.engine.device;

/**
 * A behavioural comparator (or, with a finite gain and no hysteresis of its own, an op-amp driven
 * open-loop): high-impedance inputs with clamp junctions to both rails, an output that moves smoothly
 * between the rails,
 * <pre>
 *   Vo = V− + (V+ − V−)·(1 + tanh(2·A·(vin+ − vin−) / (V+ − V−))) / 2      (slope A at the switching point)
 * </pre>
 * behind an output resistance, a quiescent supply current, and the output current drawn from the upper
 * rail when sourcing and returned to the lower rail when sinking. An open-drain output only sinks, through
 * its on-resistance, when vin+ < vin−. [Behavioural form of our own; the clamp-to-rail input structure
 * and its absolute-maximum margin are common practice for CMOS inputs, docs/sources.md#semiconductor-inputs.]
 *
 * @param gain A, V/V
 * @param outputOhms output resistance (push-pull) or on-resistance (open drain), Ω
 * @param quiescentAmps supply current with no load, A
 * @param openDrain true for an open-drain output
 * @param clamp the input clamp junctions (each input to each rail)
 */
public record ComparatorModel(double gain, double outputOhms, double quiescentAmps, boolean openDrain,
		DiodeModel clamp) {

	/** A generic CMOS comparator: A = 1e5, 50 Ω push-pull output, 10 µA quiescent. [unconfirmed: typical values] */
	public static final ComparatorModel GENERIC = new ComparatorModel(1e5, 50, 10e-6, false, DiodeModel.SILICON);

	public ComparatorModel {
		if (!(gain > 0 && outputOhms > 0 && quiescentAmps >= 0) || clamp == null) {
			throw new IllegalArgumentException("comparator parameters must be positive");
		}
	}

	public ComparatorModel withOpenDrain(boolean value) {
		return new ComparatorModel(gain, outputOhms, quiescentAmps, value, clamp);
	}
}
