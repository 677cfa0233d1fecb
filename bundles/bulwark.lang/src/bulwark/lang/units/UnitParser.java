package bulwark.lang.units;

import java.util.Map;
import java.util.Optional;

import javax.measure.Prefix;
import javax.measure.UnitConverter;

import static javax.measure.MetricPrefix.ATTO;
import static javax.measure.MetricPrefix.FEMTO;
import static javax.measure.MetricPrefix.GIGA;
import static javax.measure.MetricPrefix.KILO;
import static javax.measure.MetricPrefix.MEGA;
import static javax.measure.MetricPrefix.MICRO;
import static javax.measure.MetricPrefix.MILLI;
import static javax.measure.MetricPrefix.NANO;
import static javax.measure.MetricPrefix.PICO;
import static javax.measure.MetricPrefix.TERA;

/**
 * Reads a unit as written after a number: an optional SI prefix (BIPM, The International System of Units,
 * 9th ed., 2019, table 7) followed by a unit symbol, as a JSR 385 unit with its factor to SI. Both "µ"
 * (micro sign) and "μ" (Greek mu) and the ASCII "u" are accepted for micro.
 */
public final class UnitParser {
	private static final Map<String, Prefix> PREFIXES = Map.ofEntries(Map.entry("a", ATTO), Map.entry("f", FEMTO),
			Map.entry("p", PICO), Map.entry("n", NANO),
			Map.entry("u", MICRO), Map.entry("µ", MICRO), Map.entry("μ", MICRO), Map.entry("m", MILLI),
			Map.entry("k", KILO), Map.entry("M", MEGA), Map.entry("G", GIGA), Map.entry("T", TERA));

	private UnitParser() {
	}

	public static Optional<ScaledUnit> parse(String text) {
		if (text == null || text.isEmpty()) {
			return Optional.empty();
		}
		Optional<Unit> plain = symbol(text);
		if (plain.isPresent()) {
			return Optional.of(scaled(plain.get(), plain.get().measure()));
		}
		String prefix = text.substring(0, text.offsetByCodePoints(0, 1));
		Prefix p = PREFIXES.get(prefix);
		if (p == null) {
			return Optional.empty();
		}
		return symbol(text.substring(prefix.length())).map(u -> scaled(u, u.measure().prefix(p)));
	}

	/** True when the text is only a prefix, as in "10k": the unit itself is missing. */
	public static boolean isBarePrefix(String text) {
		return PREFIXES.containsKey(text);
	}

	private static ScaledUnit scaled(Unit unit, javax.measure.Unit<?> measure) {
		return new ScaledUnit(unit, measure, toSystem(measure).convert(1.0));
	}

	@SuppressWarnings({ "unchecked", "rawtypes" })
	private static UnitConverter toSystem(javax.measure.Unit measure) {
		return measure.getConverterTo(measure.getSystemUnit());
	}

	private static Optional<Unit> symbol(String text) {
		for (Unit u : Unit.values()) {
			if (u.symbols().contains(text)) {
				return Optional.of(u);
			}
		}
		return Optional.empty();
	}
}
