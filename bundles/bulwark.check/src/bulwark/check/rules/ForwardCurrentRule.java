package bulwark.check.rules;

import java.util.Set;

import bulwark.check.finding.Concern;
import bulwark.check.finding.Severity;
import bulwark.lang.design.PartKind;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;

/**
 * A diode, LED or zener carries more forward current than it is rated for, derated: a clamp diode
 * taking a fault, an LED driven from a terminal without enough series resistance.
 */
public final class ForwardCurrentRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("forward-current");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.FORWARD_CURRENT, Severity.ERROR,
			"a diode, LED or zener carries more forward current than its derated rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.DIODE, PartKind.LED, PartKind.ZENER);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.FORWARD;
	}
}
