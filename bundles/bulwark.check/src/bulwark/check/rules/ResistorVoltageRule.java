package bulwark.check.rules;

import java.util.Set;

import bulwark.check.finding.Concern;
import bulwark.check.finding.Severity;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;

/**
 * A resistor on its own has more voltage across it than its limiting element voltage, derated: it may
 * flash over however little it dissipates. With resistor-power this applies MIL-PRF-39005G §3.5.8's rated
 * voltage, min(√(P·R), limiting element voltage). Resistors in a series string are left to series-string,
 * which reports the whole string.
 */
public final class ResistorVoltageRule extends PartLimitRule {
	public static final RuleId ID = RuleId.of("resistor-voltage");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.VOLTAGE, Severity.ERROR,
			"a resistor has more voltage across it than its derated limiting element voltage");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public Set<PartKind> kinds() {
		return Set.of(PartKind.RESISTOR);
	}

	@Override
	public Measure measure(PartKind kind) {
		return StressCatalog.VOLTAGE;
	}

	@Override
	boolean applies(Part part, CheckContext context) {
		return !context.inSeriesString().contains(part.getName());
	}
}
