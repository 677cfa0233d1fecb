package bulwark.check.rules;

import java.util.Set;

import bulwark.check.Concern;
import bulwark.check.Severity;
import bulwark.lang.design.PartKind;

/**
 * A part other than a resistor dissipates more than its rated power, derated: a zener clamping a fault, a
 * transistor in its linear region, an indicator across a mains peak. Power is Σ V·I over the part's pins.
 */
public final class DevicePowerRule extends PartLimitRule {
	public static final String ID = "device-power";
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.POWER, Severity.ERROR,
			"a diode, transistor, potentiometer, indicator or protector dissipates more than its derated power rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	Set<PartKind> kinds() {
		return Set.of(PartKind.DIODE, PartKind.LED, PartKind.ZENER, PartKind.NPN, PartKind.PNP, PartKind.NMOS, PartKind.PMOS,
				PartKind.POTENTIOMETER, PartKind.INDICATOR, PartKind.PROTECTOR);
	}

	@Override
	String rating(PartKind kind) {
		return "power";
	}
}
