package bulwark.check.policy;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import bulwark.check.policy.ReviewPolicy.Derating;
import bulwark.check.policy.ReviewPolicy.MainsSystem;
import bulwark.lang.design.PartKind;

/**
 * The policy a design is checked under when it names none, and the base every policy file starts from.
 * Each value carries its source as the user sees it; docs/sources.md#derating gives the details.
 */
public final class DefaultPolicy {
	/** IEC 60038 nominal voltages with their ±10 % supply tolerance: 357.8 V and 186.7 V peak. */
	public static final List<MainsSystem> MAINS = List.of(new MainsSystem(230, 10), new MainsSystem(120, 10));
	/** Hysteresis a comparator input should have at least [common practice: tens of millivolts against noise]. */
	public static final double MINIMUM_HYSTERESIS_VOLTS = 10e-3;

	private static final String NASA = "NASA EEE-INST-002, derating section";
	/** The semiconductor levels are recalled, not read again: the user is told so [docs/sources.md#unconfirmed]. */
	private static final String NASA_UNCONFIRMED = "NASA EEE-INST-002 level, unconfirmed (docs/sources.md#unconfirmed)";

	private DefaultPolicy() {
	}

	public static final ReviewPolicy POLICY = new ReviewPolicy("built-in policy",
			new ReviewPolicy.Abuse(MAINS, List.of(), List.of()), derating(),
			new ReviewPolicy.HysteresisMinimum(Optional.of(MINIMUM_HYSTERESIS_VOLTS), Optional.empty()), Map.of(),
			new ReviewPolicy.WaiverDemands(true, true), Distribution.UNIFORM);

	static Map<ReviewPolicy.RatingKey, Derating> derating() {
		Map<ReviewPolicy.RatingKey, Derating> d = new LinkedHashMap<>();
		d.put(ReviewPolicy.key(PartKind.RESISTOR, "power"), new Derating(0.6, NASA + ", film resistors"));
		d.put(ReviewPolicy.key(PartKind.RESISTOR, "voltage"), new Derating(0.8, NASA + ", film resistors"));
		d.put(ReviewPolicy.key(PartKind.POTENTIOMETER, "power"), new Derating(0.6, NASA + ", film resistors"));
		d.put(ReviewPolicy.key(PartKind.CAPACITOR, "voltage"), new Derating(0.6, NASA + ", ceramic capacitors"));
		for (PartKind k : List.of(PartKind.DIODE, PartKind.LED, PartKind.ZENER)) {
			d.put(ReviewPolicy.key(k, "reverse"), new Derating(0.7, NASA_UNCONFIRMED + ", diodes"));
			d.put(ReviewPolicy.key(k, "forward"), new Derating(0.5, NASA_UNCONFIRMED + ", diodes"));
		}
		for (PartKind k : List.of(PartKind.NPN, PartKind.PNP)) {
			d.put(ReviewPolicy.key(k, "collector_emitter"), new Derating(0.75, NASA_UNCONFIRMED + ", transistors"));
			d.put(ReviewPolicy.key(k, "power"), new Derating(0.5, NASA_UNCONFIRMED + ", transistors"));
		}
		for (PartKind k : List.of(PartKind.NMOS, PartKind.PMOS)) {
			d.put(ReviewPolicy.key(k, "drain_source"), new Derating(0.75, NASA_UNCONFIRMED + ", transistors"));
			d.put(ReviewPolicy.key(k, "power"), new Derating(0.5, NASA_UNCONFIRMED + ", transistors"));
		}
		return d;
	}
}
