package bulwark.check.compile;

import bulwark.engine.device.BjtModel;
import bulwark.engine.device.ComparatorModel;
import bulwark.engine.device.DiodeModel;
import bulwark.engine.device.Physics;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/** The engine's device models for a part, from its parameters and the defaults the language documents. */
final class DeviceModels {
	/** Current at which an LED's forward voltage is stated [common practice for indicator LEDs]. */
	static final double LED_REFERENCE_CURRENT = 20e-3;
	/** Emission coefficient of an LED when the design gives none [memory: typical of visible LEDs]. */
	static final double LED_EMISSION = 2;
	/** Current at a zener's stated voltage when the design gives none [common practice: 5 mA test current]. */
	static final double ZENER_KNEE = 5e-3;

	private DeviceModels() {
	}

	static DiodeModel diode(Part part) {
		DiodeModel base = DiodeModel.SILICON;
		double emission = Settings.parameter(part, "emission")
				.orElse(part.getKind() == PartKind.LED ? LED_EMISSION : base.emission());
		double saturation;
		if (part.getKind() == PartKind.LED) {
			// Is from the forward voltage at the reference current: If = Is·(exp(Vf/(n·Vt)) − 1)
			double vf = Settings.parameter(part, "forward").orElseThrow();
			double nvt = emission * Physics.thermalVoltage(base.kelvin());
			saturation = LED_REFERENCE_CURRENT / Math.expm1(vf / nvt);
		} else {
			saturation = Settings.parameter(part, "saturation").orElse(base.saturationCurrent());
		}
		double breakdown = Settings.parameter(part, "breakdown").orElse(Double.POSITIVE_INFINITY);
		double knee = Settings.parameter(part, "knee")
				.orElse(part.getKind() == PartKind.ZENER ? ZENER_KNEE : base.breakdownCurrent());
		return new DiodeModel(saturation, emission, Settings.parameter(part, "resistance").orElse(0.0), breakdown,
				knee, base.breakdownEmission(), base.kelvin());
	}

	static ComparatorModel comparator(Part part) {
		ComparatorModel base = ComparatorModel.GENERIC;
		return new ComparatorModel(Settings.parameter(part, "gain").orElse(base.gain()),
				Settings.parameter(part, "resistance").orElse(base.outputOhms()),
				Settings.parameter(part, "quiescent").orElse(base.quiescentAmps()), false, base.clamp());
	}

	static BjtModel bjt(Part part) {
		BjtModel base = BjtModel.SMALL_SIGNAL;
		return new BjtModel(Settings.parameter(part, "saturation").orElse(base.saturationCurrent()),
				Settings.parameter(part, "beta").orElse(base.forwardBeta()),
				Settings.parameter(part, "reverse_beta").orElse(base.reverseBeta()), base.forwardEmission(),
				base.reverseEmission(), Settings.parameter(part, "breakdown").orElse(base.emitterBaseBreakdown()),
				base.breakdownCurrent(), base.kelvin());
	}
}
