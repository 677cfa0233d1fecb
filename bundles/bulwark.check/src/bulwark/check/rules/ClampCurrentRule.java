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
 * The current through a comparator input's clamp junctions exceeds what they are rated for. An input
 * driven past its rails must have its clamp current limited, 10 mA being the usual ceiling [common
 * practice, sources.md]; that is assumed when the design gives no 'rated clamp'.
 */
public final class ClampCurrentRule extends PartLimitRule {
	public static final String ID = "clamp-current";
	/** Assumed clamp current rating [common practice, sources.md]. */
	static final double ASSUMED_CLAMP = 10e-3;
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.CLAMP_CURRENT, Severity.ERROR,
			"a comparator input's clamp current is over its rating");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	Set<PartKind> kinds() {
		return Set.of(PartKind.COMPARATOR);
	}

	@Override
	Optional<Limit> limit(Part part) {
		return Optional.of(Settings.rating(part, "clamp").map(Limit::rated)
				.orElse(new Limit(ASSUMED_CLAMP, "the assumed")));
	}

	/** The larger input current: the inputs draw nothing but their clamps' current. */
	@Override
	double stress(OperatingPoint p) {
		return Math.max(Math.abs(p.pinCurrent("in_plus")), Math.abs(p.pinCurrent("in_minus")));
	}

	@Override
	String unit() {
		return "A";
	}

	@Override
	String message(Part part, WorstCase worst, Limit limit) {
		return String.format(Locale.ROOT, "an input of %s carries %s of clamp current in case '%s', over %s %s (%.0f %%)",
				part.getName(), Figures.engineering(worst.value(), "A"), worst.caseName(), limit.basis(),
				Figures.engineering(limit.value(), "A"), 100 * worst.value() / limit.value());
	}
}
