package bulwark.check.rules;

import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import bulwark.check.Concern;
import bulwark.check.Finding;
import bulwark.check.Severity;
import bulwark.check.compile.ResistorRatings;
import bulwark.check.compile.ResistorRatings.VoltageRating;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * A resistor has more voltage across it than its limiting element voltage — the failure of a series
 * string whose resistors were chosen by power alone: each dissipates little, but flashes over. With
 * resistor-power this applies MIL-PRF-39005G §3.5.8's rated voltage, min(√(P·R), limiting element
 * voltage). The worst case over all cases is reported on the designator.
 */
public final class ResistorVoltageRule implements Rule {
	public static final String ID = "resistor-voltage";
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.SERIES_STRING, Severity.ERROR,
			"a resistor has more voltage across it than its limiting element voltage");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			if (part.getKind() != PartKind.RESISTOR) {
				continue;
			}
			Optional<VoltageRating> rated = ResistorRatings.limitingElementVoltage(part);
			if (rated.isEmpty()) {
				continue;
			}
			Optional<WorstCase> found = WorstCase.of(context, part.getName(), p -> Math.abs(p.voltage()));
			double limit = rated.get().volts();
			if (found.isPresent() && found.get().value() > limit) {
				double worst = found.get().value();
				String worstCase = found.get().caseName();
				String message = String.format(Locale.ROOT, "%s has %s across it in case '%s', over its rated %s (%s; %.0f %%)",
						part.getName(), Figures.engineering(worst, "V"), worstCase, Figures.engineering(limit, "V"),
						rated.get().basis(), 100 * worst / limit);
				findings.accept(OverLimit.of(INFO, part, found.get(), limit, "V", message));
			}
		}
	}
}
