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
	private static final KindSpec RESISTOR = new KindSpec("resistor", List.of("a", "b"),
			List.of(new SettingSpec("value", Unit.OHM, true, "resistance")),
			List.of(new SettingSpec("power", Unit.WATT, false, "rated power"),
					new SettingSpec("voltage", Unit.VOLT, false, "rated working voltage")));
	private static final KindSpec SOURCE = new KindSpec("source", List.of("plus", "minus"),
			List.of(new SettingSpec("voltage", Unit.VOLT, true, "DC voltage of plus against minus"),
					new SettingSpec("resistance", Unit.OHM, false, "internal resistance (0 Ω when omitted)")),
			List.of());
	private static final KindSpec BATTERY = new KindSpec("battery", List.of("plus", "minus"),
			List.of(new SettingSpec("emf", Unit.VOLT, true, "open-circuit voltage"),
					new SettingSpec("resistance", Unit.OHM, false, "internal resistance (0 Ω when omitted)"),
					new SettingSpec("capacity", Unit.AMPERE_HOUR, false, "rated capacity")),
			List.of());

	// Diode parameters are those of the engine's junction model (bulwark.engine.device.DiodeModel).
	private static final List<SettingSpec> JUNCTION = List.of(
			new SettingSpec("saturation", Unit.AMPERE, false, "saturation current Is (10 fA when omitted)"),
			new SettingSpec("emission", null, false, "emission coefficient n (1 when omitted)"),
			new SettingSpec("resistance", Unit.OHM, false, "series resistance (0 Ω when omitted)"),
			new SettingSpec("breakdown", Unit.VOLT, false, "reverse breakdown voltage (none when omitted)"),
			new SettingSpec("knee", Unit.AMPERE, false, "reverse current at the breakdown voltage (1 mA when omitted)"));
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
					new SettingSpec("resistance", Unit.OHM, false, "series resistance (0 Ω when omitted)")),
			JUNCTION_RATINGS);
	private static final KindSpec LED = new KindSpec("led", List.of("anode", "cathode"),
			List.of(new SettingSpec("forward", Unit.VOLT, true, "forward voltage at 20 mA"),
					new SettingSpec("emission", null, false, "emission coefficient n (2 when omitted)"),
					new SettingSpec("resistance", Unit.OHM, false, "series resistance (0 Ω when omitted)")),
			JUNCTION_RATINGS);
	private static final List<SettingSpec> TRANSISTOR = List.of(
			new SettingSpec("beta", null, false, "forward current gain βF (100 when omitted)"),
			new SettingSpec("reverse_beta", null, false, "reverse current gain βR (1 when omitted)"),
			new SettingSpec("saturation", Unit.AMPERE, false, "saturation current Is (10 fA when omitted)"),
			new SettingSpec("breakdown", Unit.VOLT, false, "reverse base-emitter breakdown voltage (6 V when omitted)"));
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
					new SettingSpec("quiescent", Unit.AMPERE, false, "supply current with no load (10 µA when omitted)")),
			List.of(new SettingSpec("input_margin", Unit.VOLT, false, "absolute-maximum input beyond either rail"),
					new SettingSpec("clamp", Unit.AMPERE, false, "rated input clamp current"),
					new SettingSpec("supply", Unit.VOLT, false, "rated supply voltage")));

	private KindCatalog() {
	}

	public static KindSpec of(PartKind kind) {
		switch (kind) {
		case RESISTOR:
			return RESISTOR;
		case SOURCE:
			return SOURCE;
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
		default:
			throw new IllegalArgumentException("no specification for " + kind);
		}
	}
}
