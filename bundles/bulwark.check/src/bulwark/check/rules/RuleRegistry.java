package bulwark.check.rules;

import java.util.List;

/** Every rule Bulwark runs, listed explicitly (no class-path scanning), in report order. */
public final class RuleRegistry {
	private static final List<Rule> ALL = List.of(new ResistorPowerRule(), new ResistorVoltageRule(),
			new DiodeReverseRule(), new BaseEmitterRule(), new ComparatorInputRule(), new ClampCurrentRule(),
			new RatingMissingRule());

	private RuleRegistry() {
	}

	public static List<Rule> all() {
		return ALL;
	}
}
