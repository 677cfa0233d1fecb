package bulwark.check.stress;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import bulwark.engine.solve.OperatingPoint;
import bulwark.lang.design.PartKind;

/**
 * Every stress of every part kind, each named after the rating it is compared with (see the language's
 * kind catalogue). Magnitudes are taken where the rating does not care about the direction (power,
 * voltage across a resistor); directions are kept where it does (reverse voltage, forward current, current
 * into a battery's positive pin).
 */
public final class StressCatalog {
	public static final Measure POWER = new Measure("power", "power", "W", p -> Math.abs(p.power()));
	public static final Measure VOLTAGE = new Measure("voltage", "voltage", "V", p -> Math.abs(p.voltage()));
	public static final Measure REVERSE = new Measure("reverse", "reverse voltage", "V",
			p -> p.reverseVoltage("junction"));
	public static final Measure FORWARD = new Measure("forward", "forward current", "A", p -> Math.max(0, p.current()));
	public static final Measure COLLECTOR_EMITTER = new Measure("collector_emitter", "collector-emitter voltage", "V",
			p -> Math.abs(p.pinVoltage("collector") - p.pinVoltage("emitter")));
	public static final Measure EMITTER_BASE = new Measure("emitter_base", "reverse base-emitter voltage", "V",
			p -> p.reverseVoltage("base-emitter"));
	public static final Measure COLLECTOR = new Measure("collector", "collector current", "A",
			p -> Math.abs(p.pinCurrent("collector")));
	public static final Measure DRAIN_SOURCE = new Measure("drain_source", "drain-source voltage", "V",
			p -> Math.abs(p.pinVoltage("drain") - p.pinVoltage("source")));
	public static final Measure GATE_SOURCE = new Measure("gate_source", "gate-source voltage", "V",
			p -> Math.abs(p.pinVoltage("gate") - p.pinVoltage("source")));
	public static final Measure DRAIN = new Measure("drain", "drain current", "A", p -> Math.abs(p.pinCurrent("drain")));
	public static final Measure INPUT_MARGIN = new Measure("input_margin", "input beyond the rails", "V",
			StressCatalog::beyondRails);
	public static final Measure CLAMP = new Measure("clamp", "input clamp current", "A",
			p -> Math.max(Math.abs(p.pinCurrent("in_plus")), Math.abs(p.pinCurrent("in_minus"))));
	public static final Measure SUPPLY = new Measure("supply", "supply voltage", "V",
			p -> p.pinVoltage("supply_plus") - p.pinVoltage("supply_minus"));
	public static final Measure BLOCKING = new Measure("blocking", "blocked voltage", "V", p -> Math.abs(p.voltage()));
	public static final Measure CURRENT = new Measure("current", "current", "A", p -> Math.abs(p.current()));
	/** Current into the positive pin: a cell being charged. */
	public static final Measure CHARGE = new Measure("charge", "charging current", "A", p -> Math.max(0, p.current()),
			true);

	private static final Map<PartKind, List<Measure>> MEASURES = Map.ofEntries(
			Map.entry(PartKind.RESISTOR, List.of(POWER, VOLTAGE)),
			Map.entry(PartKind.POTENTIOMETER, List.of(POWER)),
			Map.entry(PartKind.CAPACITOR, List.of(VOLTAGE)),
			Map.entry(PartKind.INDUCTOR, List.of(CURRENT)),
			Map.entry(PartKind.DIODE, List.of(REVERSE, FORWARD, POWER)),
			Map.entry(PartKind.LED, List.of(REVERSE, FORWARD, POWER)),
			Map.entry(PartKind.ZENER, List.of(POWER, FORWARD)),
			Map.entry(PartKind.NPN, List.of(COLLECTOR_EMITTER, EMITTER_BASE, COLLECTOR, POWER)),
			Map.entry(PartKind.PNP, List.of(COLLECTOR_EMITTER, EMITTER_BASE, COLLECTOR, POWER)),
			Map.entry(PartKind.NMOS, List.of(DRAIN_SOURCE, GATE_SOURCE, DRAIN, POWER)),
			Map.entry(PartKind.PMOS, List.of(DRAIN_SOURCE, GATE_SOURCE, DRAIN, POWER)),
			Map.entry(PartKind.COMPARATOR, List.of(INPUT_MARGIN, CLAMP, SUPPLY)),
			Map.entry(PartKind.PROTECTOR, List.of(BLOCKING, POWER)),
			Map.entry(PartKind.FUSE, List.of(VOLTAGE)),
			Map.entry(PartKind.RESETTABLE_FUSE, List.of(VOLTAGE)),
			Map.entry(PartKind.INDICATOR, List.of(POWER, VOLTAGE)),
			Map.entry(PartKind.LINK, List.of(CURRENT)),
			Map.entry(PartKind.BATTERY, List.of(CHARGE)),
			Map.entry(PartKind.SOURCE, List.of()),
			Map.entry(PartKind.CURRENT_SOURCE, List.of()));

	private StressCatalog() {
	}

	public static List<Measure> of(PartKind kind) {
		return MEASURES.getOrDefault(kind, List.of());
	}

	public static Optional<Measure> of(PartKind kind, String rating) {
		return of(kind).stream().filter(m -> m.rating().equals(rating)).findFirst();
	}

	/** How far the farther comparator input is outside its rails (negative when both are inside). */
	private static double beyondRails(OperatingPoint p) {
		double high = p.pinVoltage("supply_plus"), low = p.pinVoltage("supply_minus");
		double worst = Double.NEGATIVE_INFINITY;
		for (String pin : new String[] { "in_plus", "in_minus" }) {
			double v = p.pinVoltage(pin);
			worst = Math.max(worst, Math.max(v - high, low - v));
		}
		return worst;
	}
}
