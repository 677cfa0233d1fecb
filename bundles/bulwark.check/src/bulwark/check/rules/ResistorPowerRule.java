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
 * A resistor dissipates more than its rated power, derated by the review policy, in some case. Dissipation is
 * P = V·I of the solved operating point (Joule heating). A resistor without a power rating is left to
 * rating-missing.
 */
public final class ResistorPowerRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("resistor-power");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.POWER, Severity.ERROR,
			"a resistor dissipates more than its derated power rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.RESISTOR);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.POWER;
	}
}
