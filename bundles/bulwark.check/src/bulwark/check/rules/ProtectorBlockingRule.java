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
 * A protector (an electronic current limiter in series with a terminal) has more voltage across it than
 * it is rated to block: once tripped it holds off the whole fault, and beyond its rating it breaks down.
 */
public final class ProtectorBlockingRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("protector-blocking");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.PROTECTOR, Severity.ERROR,
			"a protector blocks more voltage than its derated blocking rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.PROTECTOR);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.BLOCKING;
	}
}
