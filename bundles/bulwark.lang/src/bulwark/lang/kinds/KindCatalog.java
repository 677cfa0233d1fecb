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
		default:
			throw new IllegalArgumentException("no specification for " + kind);
		}
	}
}
