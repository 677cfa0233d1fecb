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
 * A diode or LED has more reverse voltage across it than its rated reverse voltage, derated (zeners work
 * in reverse by design and are left out). LEDs are the usual victims: their reverse rating is a few volts.
 */
public final class DiodeReverseRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("diode-reverse");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.REVERSE_VOLTAGE, Severity.ERROR,
			"a diode or LED has more reverse voltage than its derated rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.DIODE, PartKind.LED);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.REVERSE;
	}
}
