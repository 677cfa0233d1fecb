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
 * A transistor carries more collector (drain) current than it is rated for, derated.
 */
public final class TransistorCurrentRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("transistor-current");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.TRANSISTOR, Severity.ERROR,
			"a transistor carries more collector or drain current than its derated rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.NPN, PartKind.PNP, PartKind.NMOS, PartKind.PMOS);
	}

	@Override
	public Measure measure(PartKind kind) {
		return kind == PartKind.NMOS || kind == PartKind.PMOS ? StressCatalog.DRAIN : StressCatalog.COLLECTOR;
	}
}
