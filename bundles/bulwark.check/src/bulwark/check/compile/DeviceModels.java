package bulwark.check.compile;

import java.util.Locale;

import bulwark.engine.device.BjtModel;
import bulwark.engine.device.ComparatorModel;
import bulwark.engine.device.DiodeModel;
import bulwark.engine.device.LedColour;
import bulwark.engine.device.MosfetModel;
import bulwark.engine.device.ProtectorModel;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.check.parts.Settings;
import bulwark.check.parts.Values;

/** The engine's device models for a part, from its parameters and the defaults the language documents. */
final class DeviceModels {
	/** Cold resistance of a fuse when the design gives none [unconfirmed: typical of small glass fuses]. */
	static final double FUSE_COLD_OHMS = 0.1;
	/**
	 * Insulation resistance of a capacitor when the design gives none: the lower of 10 GΩ and 100 MΩ·µF over
	 * its capacitance [unconfirmed: the form ceramic-capacitor specifications give their minimum in; the figures
	 * are recalled, docs/sources.md#unconfirmed]. It lets a net held only by capacitors solve at DC.
	 */
	static final double CAPACITOR_LEAKAGE_MAX_OHMS = 10e9;
	static final double CAPACITOR_LEAKAGE_OHM_FARADS = 100e6 * 1e-6;
	/**
	 * Resistance of a 0 Ω link when the design gives none [common practice: zero-ohm chip links are specified
	 * at a few tens of milliohms at most]; not 0, which would make its two nets one and leave no current to judge.
	 */
	static final double LINK_OHMS = 10e-3;
	/** Activation current of an indicator when the design gives none [common practice: a visible LED]. */
	static final double INDICATOR_ACTIVATION = 1e-3;
	/** Trip delay of a protector when the design gives none [unconfirmed: typical of electronic current limiters]. */
	static final double PROTECTOR_DELAY = 1e-6;
	/** Emission coefficient of an LED when the design gives none [unconfirmed: typical of visible LEDs]. */
	static final double LED_EMISSION = 2;
	/** Current at a zener's stated voltage when the design gives none [common practice: 5 mA test current]. */
	static final double ZENER_KNEE = 5e-3;

	private DeviceModels() {
	}

	static DiodeModel diode(Part part, Values values) {
		DiodeModel base = DiodeModel.SILICON;
		double emission = values.parameter(part, "emission")
				.orElse(part.getKind() == PartKind.LED ? LED_EMISSION : base.emission());
		double saturation;
		if (part.getKind() == PartKind.LED) {
			// Is from the forward voltage at 20 mA, given or by colour (red when neither is)
			double vf = values.parameter(part, "forward").orElseGet(() -> LedColour
					.valueOf(Settings.word(part, "colour").orElse("red").toUpperCase(Locale.ROOT)).forwardVolts());
			saturation = DiodeModel.led(vf, emission).saturationCurrent();
		} else {
			saturation = values.parameter(part, "saturation").orElse(base.saturationCurrent());
		}
		double breakdown = values.parameter(part, "breakdown").orElse(Double.POSITIVE_INFINITY);
		double knee = values.parameter(part, "knee")
				.orElse(part.getKind() == PartKind.ZENER ? ZENER_KNEE : base.breakdownCurrent());
		return new DiodeModel(saturation, emission, values.parameter(part, "resistance").orElse(0.0), breakdown,
				knee, values.parameter(part, "knee_emission").orElse(base.breakdownEmission()), base.kelvin());
	}

	static ComparatorModel comparator(Part part, Values values) {
		ComparatorModel base = ComparatorModel.GENERIC;
		return new ComparatorModel(values.parameter(part, "gain").orElse(base.gain()),
				values.parameter(part, "resistance").orElse(base.outputOhms()),
				values.parameter(part, "quiescent").orElse(base.quiescentAmps()),
				Settings.word(part, "output").map("open_drain"::equals).orElse(false), base.clamp());
	}

	static MosfetModel mosfet(Part part, Values values) {
		MosfetModel base = MosfetModel.SMALL_SIGNAL;
		double drive = values.parameter(part, "drive").orElse(base.beta() / 2); // Id at 1 V overdrive = β/2
		return new MosfetModel(values.parameter(part, "threshold").orElse(base.threshold()), 2 * drive, base.lambda(),
				base.bodyDiode());
	}

	static ProtectorModel protector(Part part, Values values) {
		return new ProtectorModel(values.parameter(part, "resistance").orElseThrow(),
				values.parameter(part, "trip").orElseThrow(), values.parameter(part, "delay").orElse(PROTECTOR_DELAY));
	}

	static BjtModel bjt(Part part, Values values) {
		BjtModel base = BjtModel.SMALL_SIGNAL;
		return new BjtModel(values.parameter(part, "saturation").orElse(base.saturationCurrent()),
				values.parameter(part, "beta").orElse(base.forwardBeta()),
				values.parameter(part, "reverse_beta").orElse(base.reverseBeta()), base.forwardEmission(),
				base.reverseEmission(), values.parameter(part, "breakdown").orElse(base.emitterBaseBreakdown()),
				values.parameter(part, "knee").orElse(base.breakdownCurrent()), base.kelvin());
	}

	/** The default insulation resistance of a capacitor of this value, Ω. */
	static double capacitorLeakage(double farads) {
		return Math.min(CAPACITOR_LEAKAGE_MAX_OHMS, CAPACITOR_LEAKAGE_OHM_FARADS / farads);
	}
}
