package bulwark.check.rules;

import java.util.Optional;
import java.util.function.Consumer;

import bulwark.check.Concern;
import bulwark.check.Finding;
import bulwark.check.Severity;
import bulwark.check.compile.Settings;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * A resistor dissipates more than its rated power in some case. Dissipation is P = V·I of the solved
 * operating point (Joule heating); the worst case over all cases is reported on the resistor's designator.
 */
public final class ResistorPowerRule implements Rule {
	public static final String ID = "resistor-power";
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.POWER, Severity.ERROR,
			"a resistor dissipates more than its rated power");

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
			Optional<Double> rated = Settings.rating(part, "power");
			if (rated.isEmpty()) {
				continue; // reported by rating-missing
			}
			Optional<WorstCase> found = WorstCase.of(context, part.getName(), p -> Math.abs(p.power()));
			if (found.isPresent() && found.get().value() > rated.get()) {
				double worst = found.get().value();
				String worstCase = found.get().caseName();
				String message = String.format(java.util.Locale.ROOT,
						"%s dissipates %s in case '%s', over its rated %s (%.0f %% of rating)", part.getName(),
						Figures.watts(worst), worstCase, Figures.watts(rated.get()), 100 * worst / rated.get());
				findings.accept(OverLimit.of(INFO, part, found.get(), rated.get(), "W", message));
			}
		}
	}
}
