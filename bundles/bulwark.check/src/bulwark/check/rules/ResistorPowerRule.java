package bulwark.check.rules;

import java.util.Set;

import bulwark.check.Concern;
import bulwark.check.Severity;
import bulwark.lang.design.PartKind;

/**
 * A resistor dissipates more than its rated power, derated by the review policy, in some case. Dissipation is
 * P = V·I of the solved operating point (Joule heating). A resistor without a power rating is left to
 * rating-missing.
 */
public final class ResistorPowerRule extends PartLimitRule {
	public static final String ID = "resistor-power";
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.POWER, Severity.ERROR,
			"a resistor dissipates more than its derated power rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	Set<PartKind> kinds() {
		return Set.of(PartKind.RESISTOR);
	}

	@Override
	String rating(PartKind kind) {
		return "power";
	}
}
