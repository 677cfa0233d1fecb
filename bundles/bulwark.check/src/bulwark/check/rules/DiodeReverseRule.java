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
 * A diode or LED has more reverse voltage across it than its rated reverse voltage (zeners work in
 * reverse by design and are left out). LEDs are the usual victims: their reverse rating is a few volts.
 */
public final class DiodeReverseRule extends PartLimitRule {
	public static final String ID = "diode-reverse";
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.REVERSE_VOLTAGE, Severity.ERROR,
			"a diode or LED has more reverse voltage than it is rated for");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	Set<PartKind> kinds() {
		return Set.of(PartKind.DIODE, PartKind.LED);
	}

	@Override
	Optional<Limit> limit(Part part) {
		return Settings.rating(part, "reverse").map(Limit::rated);
	}

	@Override
	double stress(OperatingPoint point) {
		return point.reverseVoltage("junction");
	}

	@Override
	String unit() {
		return "V";
	}

	@Override
	String message(Part part, WorstCase worst, Limit limit) {
		return String.format(Locale.ROOT, "%s is reverse-biased by %s in case '%s', over its rated %s (%.0f %%)",
				part.getName(), Figures.engineering(worst.value(), "V"), worst.caseName(),
				Figures.engineering(limit.value(), "V"), 100 * worst.value() / limit.value());
	}
}
