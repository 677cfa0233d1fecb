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
 * The current through a comparator input's clamp junctions exceeds what they are rated for. An input
 * driven past its rails must have its clamp current limited, 10 mA being the usual ceiling [common
 * practice, docs/sources.md#semiconductor-inputs]; that is assumed when the design gives no 'rated clamp'.
 */
public final class ClampCurrentRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("clamp-current");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.CLAMP_CURRENT, Severity.ERROR,
			"a comparator input's clamp current is over its rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.COMPARATOR);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.CLAMP;
	}
}
