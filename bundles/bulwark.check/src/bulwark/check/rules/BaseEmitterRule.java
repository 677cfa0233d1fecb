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
 * A bipolar transistor's base–emitter junction is reverse-biased beyond its rating. Small-signal parts
 * break down at about 5–6 V, and even brief breakdown degrades their current gain [common practice,
 * sources.md]; when the design gives no 'rated emitter_base', 5 V is assumed and the message says so.
 */
public final class BaseEmitterRule implements Rule {
	public static final String ID = "base-emitter-reverse";
	/** Assumed reverse base–emitter rating when none is written [common practice, sources.md: VEBO ≈ 5–6 V]. */
	static final double ASSUMED_VEBO = 5;
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.BASE_EMITTER, Severity.ERROR,
			"a transistor's base-emitter junction is reverse-biased beyond its rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			if (part.getKind() != PartKind.NPN && part.getKind() != PartKind.PNP) {
				continue;
			}
			Optional<Double> given = Settings.rating(part, "emitter_base");
			double rated = given.orElse(ASSUMED_VEBO);
			Optional<WorstCase> worst = WorstCase.of(context, part.getName(), p -> p.reverseVoltage("base-emitter"));
			if (worst.isPresent() && worst.get().value() > rated) {
				double v = worst.get().value();
				findings.accept(OverLimit.of(INFO, part, worst.get(), rated, "V",
						String.format(Locale.ROOT, "%s's base-emitter junction is reverse-biased by %s in case '%s', over %s %s (%.0f %%)",
								part.getName(), Figures.engineering(v, "V"), worst.get().caseName(),
								given.isPresent() ? "its rated" : "the assumed small-signal", Figures.engineering(rated, "V"),
								100 * v / rated)));
			}
		}
	}
}
