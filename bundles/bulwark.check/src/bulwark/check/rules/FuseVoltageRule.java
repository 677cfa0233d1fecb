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
 * A fuse that opens in a case is left holding the whole fault across it; above its rated voltage it may
 * not break the current (an arc keeps it going). Cases where a fuse opens are solved again with it open.
 */
public final class FuseVoltageRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("fuse-voltage");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.FUSE, Severity.ERROR,
			"an opened fuse has more voltage across it than it is rated to break");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.FUSE, PartKind.RESETTABLE_FUSE);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.VOLTAGE;
	}
}
