package bulwark.check.rules;

import java.util.Set;

import bulwark.check.Concern;
import bulwark.check.Severity;
import bulwark.lang.design.PartKind;

/**
 * A diode or LED has more reverse voltage across it than its rated reverse voltage, derated (zeners work
 * in reverse by design and are left out). LEDs are the usual victims: their reverse rating is a few volts.
 */
public final class DiodeReverseRule extends PartLimitRule {
	public static final String ID = "diode-reverse";
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.REVERSE_VOLTAGE, Severity.ERROR,
			"a diode or LED has more reverse voltage than its derated rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	Set<PartKind> kinds() {
		return Set.of(PartKind.DIODE, PartKind.LED);
	}

	@Override
	String rating(PartKind kind) {
		return "reverse";
	}
}
