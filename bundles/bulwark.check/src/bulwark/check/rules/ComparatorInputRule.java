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
 * A comparator input goes beyond its supply rails by more than its absolute-maximum margin. CMOS inputs
 * allow about 0.3 V beyond either rail [common practice, docs/sources.md#semiconductor-inputs]; that is assumed when the design
 * gives no 'rated input_margin'.
 */
public final class ComparatorInputRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("comparator-input");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.COMPARATOR_INPUT, Severity.ERROR,
			"a comparator input goes beyond its rails by more than its margin");

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
		return StressCatalog.INPUT_MARGIN;
	}
}
