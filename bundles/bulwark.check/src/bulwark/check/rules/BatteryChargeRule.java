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
 * A fault drives current into a battery's positive pin, charging it. Primary cells must not be charged
 * (they can vent or burst); when the design gives no 'rated charge', a primary cell is assumed to tolerate
 * 10 µA [unconfirmed, see Limits], and a battery marked 'type rechargeable' is checked only against a written
 * rating.
 */
public final class BatteryChargeRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("battery-charge");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.BATTERY, Severity.ERROR,
			"a fault pushes current into a battery that must not be charged");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.BATTERY);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.CHARGE;
	}
}
