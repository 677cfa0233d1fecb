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
 * A bipolar transistor's base–emitter junction is reverse-biased beyond its rating. Small-signal parts
 * break down at about 5–6 V, and even brief breakdown degrades their current gain [common practice,
 * sources.md]; when the design gives no 'rated emitter_base', 5 V is assumed and the message says so.
 */
public final class BaseEmitterRule extends PartLimitRule {
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
	Set<PartKind> kinds() {
		return Set.of(PartKind.NPN, PartKind.PNP);
	}

	@Override
	Optional<Limit> limit(Part part) {
		return Optional.of(Settings.rating(part, "emitter_base").map(Limit::rated)
				.orElse(new Limit(ASSUMED_VEBO, "the assumed small-signal")));
	}

	@Override
	double stress(OperatingPoint point) {
		return point.reverseVoltage("base-emitter");
	}

	@Override
	String unit() {
		return "V";
	}

	@Override
	String message(Part part, WorstCase worst, Limit limit) {
		return String.format(Locale.ROOT,
				"%s's base-emitter junction is reverse-biased by %s in case '%s', over %s %s (%.0f %%)", part.getName(),
				Figures.engineering(worst.value(), "V"), worst.caseName(), limit.basis(),
				Figures.engineering(limit.value(), "V"), 100 * worst.value() / limit.value());
	}
}
