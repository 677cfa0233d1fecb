package bulwark.check.rules;

import java.util.Set;

import bulwark.check.finding.Concern;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;
import bulwark.check.finding.Severity;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.lang.design.PartKind;

/** A 0 Ω link carries more current than its derated rating: its worst over every case against the rating, derated. */
public final class LinkCurrentRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("link-current");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.CURRENT, Severity.ERROR,
			"a 0 Ω link carries more current than its derated rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.LINK);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.CURRENT;
	}
}
