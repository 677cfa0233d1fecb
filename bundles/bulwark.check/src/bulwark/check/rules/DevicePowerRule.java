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
 * A part other than a resistor dissipates more than its rated power, derated: a zener clamping a fault, a
 * transistor in its linear region, an indicator across a mains peak. Power is Σ V·I over the part's pins.
 */
public final class DevicePowerRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("device-power");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.POWER, Severity.ERROR,
			"a diode, transistor, potentiometer, indicator or protector dissipates more than its derated power rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.DIODE, PartKind.LED, PartKind.ZENER, PartKind.NPN, PartKind.PNP, PartKind.NMOS, PartKind.PMOS,
				PartKind.POTENTIOMETER, PartKind.INDICATOR, PartKind.PROTECTOR);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.POWER;
	}
}
