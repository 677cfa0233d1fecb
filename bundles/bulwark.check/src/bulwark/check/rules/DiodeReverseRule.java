package bulwark.check.rules;

import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import bulwark.check.Concern;
import bulwark.check.Finding;
import bulwark.check.Severity;
import bulwark.check.compile.Settings;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * A diode or LED has more reverse voltage across it than its rated reverse voltage (zeners work in
 * reverse by design and are left out). LEDs are the usual victims: their reverse rating is a few volts.
 */
public final class DiodeReverseRule implements Rule {
	public static final String ID = "diode-reverse";
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.REVERSE_VOLTAGE, Severity.ERROR,
			"a diode or LED has more reverse voltage than it is rated for");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			if (part.getKind() != PartKind.DIODE && part.getKind() != PartKind.LED) {
				continue;
			}
			Optional<Double> rated = Settings.rating(part, "reverse");
			if (rated.isEmpty()) {
				continue;
			}
			Optional<WorstCase> worst = WorstCase.of(context, part.getName(), p -> p.reverseVoltage("junction"));
			if (worst.isPresent() && worst.get().value() > rated.get()) {
				double v = worst.get().value();
				findings.accept(OverLimit.of(INFO, part, worst.get(), rated.get(), "V",
						String.format(Locale.ROOT, "%s is reverse-biased by %s in case '%s', over its rated %s (%.0f %%)",
								part.getName(), Figures.engineering(v, "V"), worst.get().caseName(),
								Figures.engineering(rated.get(), "V"), 100 * v / rated.get())));
			}
		}
	}
}
