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
 * A capacitor has more voltage across it than its rated voltage, derated (NASA EEE-INST-002 derates
 * ceramic capacitors to 60 % of their rating, DC plus peak ripple).
 */
public final class CapacitorVoltageRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("capacitor-voltage");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.CAPACITOR_VOLTAGE, Severity.ERROR,
			"a capacitor has more voltage across it than its derated rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.CAPACITOR);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.VOLTAGE;
	}
}
