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
 * A transistor has more voltage between collector and emitter (drain and source) than it is rated for,
 * derated: a switch in the input path that sees the fault across it.
 */
public final class TransistorVoltageRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("transistor-voltage");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.TRANSISTOR, Severity.ERROR,
			"a transistor has more collector-emitter or drain-source voltage than its derated rating");

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
		return kind == PartKind.NMOS || kind == PartKind.PMOS ? StressCatalog.DRAIN_SOURCE : StressCatalog.COLLECTOR_EMITTER;
	}
}
