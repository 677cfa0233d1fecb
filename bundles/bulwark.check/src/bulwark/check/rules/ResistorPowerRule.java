package bulwark.check.rules;

import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import bulwark.check.Concern;
import bulwark.check.Severity;
import bulwark.check.compile.Settings;
import bulwark.engine.dc.OperatingPoint;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * A resistor dissipates more than its rated power in some case. Dissipation is P = V·I of the solved
 * operating point (Joule heating); the worst case over all cases is reported on the resistor's designator.
 * A resistor without a power rating is left to rating-missing.
 */
public final class ResistorPowerRule extends PartLimitRule {
	public static final String ID = "resistor-power";
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.POWER, Severity.ERROR,
			"a resistor dissipates more than its rated power");

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
		return Settings.rating(part, "power").map(Limit::rated);
	}

	@Override
	double stress(OperatingPoint point) {
		return Math.abs(point.power());
	}

	@Override
	String unit() {
		return "W";
	}

	@Override
	String message(Part part, WorstCase worst, Limit limit) {
		return String.format(Locale.ROOT, "%s dissipates %s in case '%s', over its rated %s (%.0f %% of rating)",
				part.getName(), Figures.watts(worst.value()), worst.caseName(), Figures.watts(limit.value()),
				100 * worst.value() / limit.value());
	}
}
