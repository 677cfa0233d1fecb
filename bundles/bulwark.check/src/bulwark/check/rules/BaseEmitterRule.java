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
 * A bipolar transistor's base–emitter junction is reverse-biased beyond its rating. Small-signal parts
 * break down at about 5–6 V, and even brief breakdown degrades their current gain [common practice,
 * docs/sources.md#semiconductor-inputs]; when the design gives no 'rated emitter_base', 5 V is assumed and the message says so.
 */
public final class BaseEmitterRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("base-emitter-reverse");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.BASE_EMITTER, Severity.ERROR,
			"a transistor's base-emitter junction is reverse-biased beyond its rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.NPN, PartKind.PNP);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.EMITTER_BASE;
	}
}
