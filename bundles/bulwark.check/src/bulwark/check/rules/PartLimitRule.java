package bulwark.check.rules;

import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.function.Consumer;

import bulwark.check.finding.Finding;
import bulwark.check.finding.Locations;
import bulwark.check.stress.Limit;
import bulwark.check.stress.Limits;
import bulwark.check.stress.Measure;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.check.figures.Figures;
import bulwark.check.finding.RuleInfo;

/**
 * What every rating rule does: for each part of its kinds, take one stress (named after the rating it is
 * compared with, see StressCatalog) at its worst over all cases and, when it exceeds the part's limit —
 * the rating, written or assumed, times the policy's derating — report it on the designator with the
 * figures. A rule says only which parts and which rating.
 */
public abstract class PartLimitRule implements FigureRule {

	public abstract Set<PartKind> kinds();

	/**
	 * The stress this rule compares, for a part of the given kind: one of the stress catalogue's measures,
	 * named after the rating it is compared with. A measure, not a rating's name, so that no lookup can miss.
	 */
	public abstract Measure measure(PartKind kind);

	/** Whether the rule checks this part at all (for example, not a resistor a series string covers). */
	boolean applies(Part part, CheckContext context) {
		return true;
	}

	@Override
	public final void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			if (!kinds().contains(part.getKind()) || !applies(part, context)) {
				continue;
			}
			Measure measure = measure(part.getKind());
			Optional<Limit> limit = Limits.of(part, measure, context.policy());
			if (limit.isEmpty()) {
				continue;
			}
			Optional<WorstCase> worst = WorstCase.of(context, part.getName(), measure);
			if (worst.isPresent() && worst.get().value() > limit.get().value()) {
				RuleInfo info = info();
				findings.accept(Finding.of(info, message(part, measure, worst.get(), limit.get()))
						.about(part.getName(), worst.get().caseName(), Locations.of(part, DesignPackage.Literals.MEMBER__NAME))
						.judged(measure.rating(), worst.get().value(), limit.get().value(), measure.unit()));
			}
		}
	}

	/** "R2: power 346 mW in case 'x', over its rated 250 mW derated to 60 % (150 mW), 231 % of the limit" (or "51,200× the limit"). */
	static String message(Part part, Measure measure, WorstCase worst, Limit limit) {
		return String.format(Locale.ROOT, "%s: %s %s in case '%s', over %s, %s", part.getName(),
				worst.what(), Figures.over(worst.value(), limit.value(), measure.unit()), worst.caseName(),
				limit.describe(), Figures.ofTheLimit(worst.value(), limit.value()));
	}
}
