package bulwark.check.rules;

import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import bulwark.check.Concern;
import bulwark.check.Finding;
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
public final class ClampCurrentRule implements Rule {
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
	public void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			if (part.getKind() != PartKind.COMPARATOR) {
				continue;
			}
			Optional<Double> given = Settings.rating(part, "clamp");
			double rated = given.orElse(ASSUMED_CLAMP);
			Optional<WorstCase> worst = WorstCase.of(context, part.getName(), ClampCurrentRule::inputCurrent);
			if (worst.isPresent() && worst.get().value() > rated) {
				double i = worst.get().value();
				findings.accept(OverLimit.of(INFO, part, worst.get(), rated, "A", String.format(Locale.ROOT,
						"an input of %s carries %s of clamp current in case '%s', over %s %s (%.0f %%)", part.getName(),
						Figures.engineering(i, "A"), worst.get().caseName(),
						given.isPresent() ? "its rated" : "the assumed", Figures.engineering(rated, "A"), 100 * i / rated)));
			}
		}
	}

	/** The larger input current: the inputs draw nothing but their clamps' current. */
	static double inputCurrent(OperatingPoint p) {
		return Math.max(Math.abs(p.pinCurrent("in_plus")), Math.abs(p.pinCurrent("in_minus")));
	}
}
