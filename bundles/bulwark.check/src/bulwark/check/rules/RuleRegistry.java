package bulwark.check.rules;

import java.util.List;

/** Every rule Bulwark runs, listed explicitly (no class-path scanning), in report order. */
public final class RuleRegistry {
	private static final List<Rule> ALL = List.of(new ResistorPowerRule(), new ResistorVoltageRule(),
			new SeriesStringRule(), new SurgeEnergyRule(), new DevicePowerRule(), new DiodeReverseRule(), new ForwardCurrentRule(),
			new BaseEmitterRule(), new TransistorVoltageRule(), new TransistorCurrentRule(), new CapacitorVoltageRule(),
			new ProtectorBlockingRule(), new FuseVoltageRule(), new BatteryChargeRule(), new ComparatorInputRule(),
			new ClampCurrentRule(), new InputRangeRule(), new ReversePathRule(), new HysteresisRule(), new RequirementRule(), new RatingMissingRule(), new PreferredValueRule());

	private RuleRegistry() {
	}

	public static List<Rule> all() {
		return ALL;
	}
}
