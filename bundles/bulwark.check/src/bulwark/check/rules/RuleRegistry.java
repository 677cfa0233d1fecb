package bulwark.check.rules;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import bulwark.check.finding.CheckerRules;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;

/** Every rule Bulwark runs, listed explicitly (no class-path scanning), in report order. */
public final class RuleRegistry {
	private static final List<Rule> ALL = List.of(new ResistorPowerRule(), new ResistorVoltageRule(),
			new SeriesStringRule(), new SurgeEnergyRule(), new DevicePowerRule(), new DiodeReverseRule(), new ForwardCurrentRule(),
			new BaseEmitterRule(), new TransistorVoltageRule(), new TransistorCurrentRule(), new GateSourceRule(),
			new CapacitorVoltageRule(), new InductorCurrentRule(), new LinkCurrentRule(), new IndicatorVoltageRule(),
			new ProtectorBlockingRule(), new FuseVoltageRule(), new BatteryChargeRule(), new ComparatorInputRule(),
			new ComparatorSupplyRule(),
			new ClampCurrentRule(), new InputRangeRule(), new ReversePathRule(), new HysteresisRule(), new RequirementRule(), new RatingMissingRule(), new PreferredValueRule(),
			new SingleFaultRule());

	private static final Set<RuleId> IDS = ALL.stream().map(r -> r.info().id())
			.collect(Collectors.toCollection(LinkedHashSet::new));
	private static final List<RuleInfo> KINDS = Stream
			.concat(ALL.stream().map(Rule::info), CheckerRules.ALL.stream()).toList();

	private RuleRegistry() {
	}

	public static List<Rule> all() {
		return ALL;
	}

	/** The rules' IDs: what a policy may set the severity of and a waiver may name. */
	public static Set<RuleId> ids() {
		return IDS;
	}

	/** Every kind of finding, the rules' and then the checker's own, in report order. */
	public static List<RuleInfo> findingKinds() {
		return KINDS;
	}

	/** The rule or checker finding of that ID. */
	public static Optional<RuleInfo> info(RuleId id) {
		return KINDS.stream().filter(i -> i.id().equals(id)).findFirst();
	}
}
