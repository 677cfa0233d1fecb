package bulwark.lang.kinds;

import java.util.List;

import bulwark.lang.design.PartKind;
import bulwark.lang.units.Unit;

/**
 * The single list of part kinds with their pins, parameters and ratings, shared by the validator, the
 * check and (later) content assist. Pin names are those of the trade: a resistor's ends are a and b,
 * a source's and a battery's plus and minus.
 */
public final class KindCatalog {
	/** Resistor packages whose limiting element voltage Bulwark knows (docs/sources.md#resistor-voltage, common practice). */
	public static final List<String> RESISTOR_PACKAGES = List.of("0402", "0603", "0805", "1206", "2512",
			"axial_quarter", "axial_half");
	private static final KindSpec RESISTOR = new KindSpec("resistor", List.of("a", "b"),
			List.of(new SettingSpec("value", Unit.OHM, true, "resistance"),
					SettingSpec.word("package", "the package, which sets the limiting element voltage",
							RESISTOR_PACKAGES)),
			List.of(new SettingSpec("power", Unit.WATT, false, "rated power"),
					new SettingSpec("voltage", Unit.VOLT, false, "rated working voltage"),
					new SettingSpec("pulse", Unit.JOULE, false, "rated single-pulse energy, from the part's pulse load curve at about 50 µs")));
	private static final KindSpec SOURCE = new KindSpec("source", List.of("plus", "minus"),
			List.of(new SettingSpec("voltage", Unit.VOLT, true, "DC voltage of plus against minus"),
					new SettingSpec("resistance", Unit.OHM, false, "internal resistance (0 Ω when omitted)")),
			List.of());
	/** An ideal current source: its current leaves by plus into the circuit and returns by minus. */
	private static final KindSpec CURRENT_SOURCE = new KindSpec("current_source", List.of("plus", "minus"),
			List.of(new SettingSpec("current", Unit.AMPERE, true, "current out of plus into the circuit")), List.of());
	private static final KindSpec BATTERY = new KindSpec("battery", List.of("plus", "minus"),
			List.of(new SettingSpec("emf", Unit.VOLT, true, "open-circuit voltage"),
					new SettingSpec("resistance", Unit.OHM, false, "internal resistance (0 Ω when omitted)"),
					new SettingSpec("capacity", Unit.AMPERE_HOUR, false, "rated capacity"),
					SettingSpec.word("type", "primary (must not be charged) or rechargeable; primary when omitted",
							List.of("primary", "rechargeable"))),
			List.of(new SettingSpec("charge", Unit.AMPERE, false, "largest current it may be charged with")));

	// Diode parameters are those of the engine's junction model (bulwark.engine.device.DiodeModel).
	private static final List<SettingSpec> JUNCTION = List.of(
			new SettingSpec("saturation", Unit.AMPERE, false, "saturation current Is (10 fA when omitted)"),
			new SettingSpec("emission", null, false, "emission coefficient n (1 when omitted)"),
			new SettingSpec("resistance", Unit.OHM, false, "series resistance (0 Ω when omitted)"),
			new SettingSpec("breakdown", Unit.VOLT, false, "reverse breakdown voltage (none when omitted)"),
			new SettingSpec("knee", Unit.AMPERE, false, "reverse current at the breakdown voltage (1 mA when omitted)"),
			KindCatalog.kneeEmission());
	private static final List<SettingSpec> JUNCTION_RATINGS = List.of(
			new SettingSpec("reverse", Unit.VOLT, false, "rated reverse voltage"),
			new SettingSpec("forward", Unit.AMPERE, false, "rated forward current"),
			new SettingSpec("power", Unit.WATT, false, "rated power"));
	private static final KindSpec DIODE = new KindSpec("diode", List.of("anode", "cathode"), JUNCTION, JUNCTION_RATINGS);
	private static final KindSpec ZENER = new KindSpec("zener", List.of("anode", "cathode"),
			List.of(new SettingSpec("breakdown", Unit.VOLT, true, "zener voltage"),
					new SettingSpec("knee", Unit.AMPERE, false, "current at the zener voltage (5 mA when omitted)"),
					new SettingSpec("saturation", Unit.AMPERE, false, "saturation current Is (10 fA when omitted)"),
					new SettingSpec("emission", null, false, "emission coefficient n (1 when omitted)"),
					new SettingSpec("resistance", Unit.OHM, false, "series resistance (0 Ω when omitted)"),
					kneeEmission()),
			JUNCTION_RATINGS);
	private static final KindSpec LED = new KindSpec("led", List.of("anode", "cathode"),
			List.of(new SettingSpec("forward", Unit.VOLT, false, "forward voltage at 20 mA (by colour when omitted)"),
					SettingSpec.word("colour", "sets the forward voltage to the middle of the colour's range (red when omitted)",
							List.of("red", "orange", "yellow", "green", "blue", "violet", "white")),
					new SettingSpec("emission", null, false, "emission coefficient n (2 when omitted)"),
					new SettingSpec("resistance", Unit.OHM, false, "series resistance (0 Ω when omitted)"),
					new SettingSpec("breakdown", Unit.VOLT, false, "reverse breakdown voltage (none when omitted)"),
					new SettingSpec("knee", Unit.AMPERE, false, "reverse current at the breakdown voltage (1 mA when omitted)"),
					kneeEmission()),
			JUNCTION_RATINGS);
	private static final List<SettingSpec> TRANSISTOR = List.of(
			new SettingSpec("beta", null, false, "forward current gain βF (100 when omitted)"),
			new SettingSpec("reverse_beta", null, false, "reverse current gain βR (1 when omitted)"),
			new SettingSpec("saturation", Unit.AMPERE, false, "saturation current Is (10 fA when omitted)"),
			new SettingSpec("breakdown", Unit.VOLT, false, "reverse base-emitter breakdown voltage (6 V when omitted)"),
			new SettingSpec("knee", Unit.AMPERE, false, "emitter-base reverse current at the breakdown voltage (1 mA when omitted)"));
	private static final List<SettingSpec> TRANSISTOR_RATINGS = List.of(
			new SettingSpec("collector_emitter", Unit.VOLT, false, "rated collector-emitter voltage"),
			new SettingSpec("emitter_base", Unit.VOLT, false, "rated reverse base-emitter voltage"),
			new SettingSpec("collector", Unit.AMPERE, false, "rated collector current"),
			new SettingSpec("power", Unit.WATT, false, "rated power"));
	private static final List<String> BJT_PINS = List.of("collector", "base", "emitter");
	private static final KindSpec NPN = new KindSpec("npn", BJT_PINS, TRANSISTOR, TRANSISTOR_RATINGS);
	private static final KindSpec PNP = new KindSpec("pnp", BJT_PINS, TRANSISTOR, TRANSISTOR_RATINGS);

	private static final KindSpec COMPARATOR = new KindSpec("comparator",
			List.of("in_plus", "in_minus", "out", "supply_plus", "supply_minus"),
			List.of(new SettingSpec("gain", null, false, "open-loop gain at the switching point (1e5 when omitted)"),
					new SettingSpec("resistance", Unit.OHM, false, "output resistance (50 Ω when omitted)"),
					new SettingSpec("quiescent", Unit.AMPERE, false, "supply current with no load (10 µA when omitted)"),
					SettingSpec.word("output", "push_pull (when omitted) drives both ways; open_drain only pulls down, "
							+ "through its resistance, and needs a pull-up", List.of("push_pull", "open_drain"))),
			List.of(new SettingSpec("input_margin", Unit.VOLT, false, "absolute-maximum input beyond either rail"),
					new SettingSpec("clamp", Unit.AMPERE, false, "rated input clamp current"),
					new SettingSpec("supply", Unit.VOLT, false, "rated supply voltage"),
					new SettingSpec("headroom", Unit.VOLT, false,
							"how far below the positive supply the inputs must stay to work (leave out for rail-to-rail inputs)")));

	private static final List<String> TWO = List.of("a", "b");
	private static final KindSpec CAPACITOR = new KindSpec("capacitor", TWO,
			List.of(new SettingSpec("value", Unit.FARAD, true, "capacitance"),
					new SettingSpec("leakage", Unit.OHM, false, "insulation resistance across it")),
			List.of(new SettingSpec("voltage", Unit.VOLT, false, "rated voltage")));
	private static final KindSpec INDUCTOR = new KindSpec("inductor", TWO,
			List.of(new SettingSpec("value", Unit.HENRY, true, "inductance")),
			List.of(new SettingSpec("current", Unit.AMPERE, false, "rated current")));
	private static final KindSpec POTENTIOMETER = new KindSpec("potentiometer", List.of("a", "b", "wiper"),
			List.of(new SettingSpec("value", Unit.OHM, true, "track resistance"),
					new SettingSpec("position", null, false, "wiper position from a (0) to b (1), 0.5 when omitted")),
			List.of(new SettingSpec("power", Unit.WATT, false, "rated power")));
	private static final List<SettingSpec> MOSFET = List.of(
			new SettingSpec("threshold", Unit.VOLT, false, "gate threshold voltage (2 V when omitted)"),
			new SettingSpec("drive", Unit.AMPERE, false, "drain current 1 V above threshold, in saturation (25 mA when omitted)"));
	private static final List<SettingSpec> MOSFET_RATINGS = List.of(
			new SettingSpec("drain_source", Unit.VOLT, false, "rated drain-source voltage"),
			new SettingSpec("gate_source", Unit.VOLT, false, "rated gate-source voltage"),
			new SettingSpec("drain", Unit.AMPERE, false, "rated drain current"),
			new SettingSpec("power", Unit.WATT, false, "rated power"));
	private static final List<String> MOSFET_PINS = List.of("drain", "gate", "source");
	private static final KindSpec NMOS = new KindSpec("nmos", MOSFET_PINS, MOSFET, MOSFET_RATINGS);
	private static final KindSpec PMOS = new KindSpec("pmos", MOSFET_PINS, MOSFET, MOSFET_RATINGS);
	private static final KindSpec PROTECTOR = new KindSpec("protector", TWO,
			List.of(new SettingSpec("resistance", Unit.OHM, true, "on-resistance below the trip current"),
					new SettingSpec("trip", Unit.AMPERE, true, "trip current"),
					new SettingSpec("delay", Unit.SECOND, false, "trip delay (1 µs when omitted)")),
			List.of(new SettingSpec("blocking", Unit.VOLT, false, "rated blocking voltage"),
					new SettingSpec("power", Unit.WATT, false, "rated power")));
	private static final KindSpec FUSE = new KindSpec("fuse", TWO,
			List.of(new SettingSpec("resistance", Unit.OHM, false, "cold resistance (0.1 Ω when omitted)")),
			List.of(new SettingSpec("current", Unit.AMPERE, false, "rated current"),
					new SettingSpec("voltage", Unit.VOLT, false, "rated voltage"),
					new SettingSpec("i2t", Unit.AMPERE_SQUARED_SECOND, false,
							"pre-arcing I²t: the ∫i²dt it takes in before it opens (2 A²s per A² of rated current when omitted)")));
	private static final KindSpec RESETTABLE_FUSE = new KindSpec("resettable_fuse", TWO,
			List.of(new SettingSpec("resistance", Unit.OHM, false, "resistance when cold (0.1 Ω when omitted)")),
			List.of(new SettingSpec("hold", Unit.AMPERE, false, "rated hold current"),
					new SettingSpec("trip", Unit.AMPERE, false, "rated trip current"),
					new SettingSpec("voltage", Unit.VOLT, false, "rated voltage"),
					new SettingSpec("i2t", Unit.AMPERE_SQUARED_SECOND, false,
							"the ∫i²dt it takes in before it trips (125 A²s per A² of hold current when omitted)")));
	private static final KindSpec INDICATOR = new KindSpec("indicator", TWO,
			List.of(new SettingSpec("resistance", Unit.OHM, true, "resistance of the lamp, buzzer or LED string"),
					new SettingSpec("activation", Unit.AMPERE, false, "current at which it is on (1 mA when omitted)")),
			List.of(new SettingSpec("power", Unit.WATT, false, "rated power"),
					new SettingSpec("voltage", Unit.VOLT, false, "rated voltage")));

	/** A 0 Ω link (jumper): one net for what it joins, a part of its own for its current and its faults. */
	private static final KindSpec LINK = new KindSpec("link", TWO,
			List.of(new SettingSpec("resistance", Unit.OHM, false, "its resistance (10 mΩ when omitted)")),
			List.of(new SettingSpec("current", Unit.AMPERE, false, "rated current")));

	/** How sharp a junction's breakdown knee is: the knee's emission coefficient, nbv of the engine's model. */
	private static SettingSpec kneeEmission() {
		return new SettingSpec("knee_emission", null, false,
				"emission coefficient of the breakdown knee nbv (1 when omitted; larger is a softer knee)");
	}

	private KindCatalog() {
	}

	/**
	 * What every kind may say of a part: {@code integrity high}, with its reason, keeps it out of the
	 * single-fault analysis (a part the designer vouches cannot fail in the way the analysis would fail it).
	 */
	public static final SettingSpec INTEGRITY = SettingSpec.word("integrity",
			"high keeps the part out of the single-fault analysis; say why with because \"…\"", List.of("high"));
	private static final java.util.Map<PartKind, KindSpec> WITH_INTEGRITY = new java.util.EnumMap<>(PartKind.class);

	public static KindSpec of(PartKind kind) {
		synchronized (WITH_INTEGRITY) {
			return WITH_INTEGRITY.computeIfAbsent(kind, k -> {
				KindSpec base = base(k);
				List<SettingSpec> parameters = new java.util.ArrayList<>(base.parameters());
				parameters.add(INTEGRITY);
				return new KindSpec(base.kind(), base.pins(), List.copyOf(parameters), base.ratings());
			});
		}
	}

	private static KindSpec base(PartKind kind) {
		switch (kind) {
		case RESISTOR:
			return RESISTOR;
		case SOURCE:
			return SOURCE;
		case CURRENT_SOURCE:
			return CURRENT_SOURCE;
		case BATTERY:
			return BATTERY;
		case DIODE:
			return DIODE;
		case ZENER:
			return ZENER;
		case LED:
			return LED;
		case NPN:
			return NPN;
		case PNP:
			return PNP;
		case COMPARATOR:
			return COMPARATOR;
		case NMOS:
			return NMOS;
		case PMOS:
			return PMOS;
		case CAPACITOR:
			return CAPACITOR;
		case INDUCTOR:
			return INDUCTOR;
		case POTENTIOMETER:
			return POTENTIOMETER;
		case PROTECTOR:
			return PROTECTOR;
		case FUSE:
			return FUSE;
		case RESETTABLE_FUSE:
			return RESETTABLE_FUSE;
		case INDICATOR:
			return INDICATOR;
		case LINK:
			return LINK;
		default:
			throw new IllegalArgumentException("no specification for " + kind);
		}
	}
}
