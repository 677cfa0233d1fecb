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
 * A comparator input goes beyond its supply rails by more than its absolute-maximum margin. CMOS inputs
 * allow about 0.3 V beyond either rail [common practice, sources.md]; that is assumed when the design
 * gives no 'rated input_margin'.
 */
public final class ComparatorInputRule extends PartLimitRule {
	public static final String ID = "comparator-input";
	/** Assumed margin beyond the rails [common practice, sources.md: 0.3 V, some parts 0.5 V]. */
	static final double ASSUMED_MARGIN = 0.3;
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.COMPARATOR_INPUT, Severity.ERROR,
			"a comparator input goes beyond its rails by more than its margin");

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
		return Optional.of(Settings.rating(part, "input_margin").map(Limit::rated)
				.orElse(new Limit(ASSUMED_MARGIN, "the assumed CMOS")));
	}

	/** How far the farther input is outside the rails (negative when both are inside). */
	@Override
	double stress(OperatingPoint p) {
		double high = p.pinVoltage("supply_plus"), low = p.pinVoltage("supply_minus");
		double worst = Double.NEGATIVE_INFINITY;
		for (String pin : new String[] { "in_plus", "in_minus" }) {
			double v = p.pinVoltage(pin);
			worst = Math.max(worst, Math.max(v - high, low - v));
		}
		return worst;
	}

	@Override
	String unit() {
		return "V";
	}

	@Override
	String message(Part part, WorstCase worst, Limit limit) {
		return String.format(Locale.ROOT, "an input of %s is %s beyond its supply rail in case '%s', over %s margin of %s",
				part.getName(), Figures.engineering(worst.value(), "V"), worst.caseName(), limit.basis(),
				Figures.engineering(limit.value(), "V"));
	}
}
