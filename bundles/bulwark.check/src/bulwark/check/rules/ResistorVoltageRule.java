package bulwark.check.rules;

import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import bulwark.check.Concern;
import bulwark.check.Severity;
import bulwark.check.compile.ResistorRatings;
import bulwark.engine.dc.OperatingPoint;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * A resistor has more voltage across it than its limiting element voltage — the failure of a series
 * string whose resistors were chosen by power alone: each dissipates little, but flashes over. With
 * resistor-power this applies MIL-PRF-39005G §3.5.8's rated voltage, min(√(P·R), limiting element
 * voltage). The worst case over all cases is reported on the designator.
 */
public final class ResistorVoltageRule extends PartLimitRule {
	public static final String ID = "resistor-voltage";
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.SERIES_STRING, Severity.ERROR,
			"a resistor has more voltage across it than its limiting element voltage");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	Set<PartKind> kinds() {
		return Set.of(PartKind.RESISTOR);
	}

	@Override
	Optional<Limit> limit(Part part) {
		return ResistorRatings.limitingElementVoltage(part).map(r -> new Limit(r.volts(), r.basis()));
	}

	@Override
	double stress(OperatingPoint point) {
		return Math.abs(point.voltage());
	}

	@Override
	String unit() {
		return "V";
	}

	@Override
	String message(Part part, WorstCase worst, Limit limit) {
		return String.format(Locale.ROOT, "%s has %s across it in case '%s', over its rated %s (%s; %.0f %%)",
				part.getName(), Figures.engineering(worst.value(), "V"), worst.caseName(),
				Figures.engineering(limit.value(), "V"), limit.basis(), 100 * worst.value() / limit.value());
	}
}
