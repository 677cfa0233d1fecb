package bulwark.lang.units;

import java.util.Map;
import java.util.Optional;

/**
 * Reads a unit as written after a number: an optional SI prefix (BIPM, The International System of Units,
 * 9th ed., 2019, table 7) followed by a unit symbol. Both "µ" (micro sign) and "μ" (Greek mu) and the ASCII
 * "u" are accepted for micro.
 */
public final class UnitParser {
	private static final Map<String, Double> PREFIXES = Map.ofEntries(Map.entry("p", 1e-12), Map.entry("n", 1e-9),
			Map.entry("u", 1e-6), Map.entry("µ", 1e-6), Map.entry("μ", 1e-6), Map.entry("m", 1e-3),
			Map.entry("k", 1e3), Map.entry("M", 1e6), Map.entry("G", 1e9), Map.entry("T", 1e12));

	private UnitParser() {
	}

	public static Optional<ScaledUnit> parse(String text) {
		if (text == null || text.isEmpty()) {
			return Optional.empty();
		}
		Optional<Unit> plain = symbol(text);
		if (plain.isPresent()) {
			return Optional.of(new ScaledUnit(plain.get(), 1.0));
		}
		String prefix = text.substring(0, text.offsetByCodePoints(0, 1));
		Double factor = PREFIXES.get(prefix);
		if (factor == null) {
			return Optional.empty();
		}
		return symbol(text.substring(prefix.length())).map(u -> new ScaledUnit(u, factor));
	}

	/** True when the text is only a prefix, as in "10k": the unit itself is missing. */
	public static boolean isBarePrefix(String text) {
		return PREFIXES.containsKey(text);
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
