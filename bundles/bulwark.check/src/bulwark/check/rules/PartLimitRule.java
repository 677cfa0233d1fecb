package bulwark.check.rules;

import java.util.Optional;
import java.util.Set;
import java.util.function.Consumer;

import bulwark.check.Finding;
import bulwark.check.Locations;
import bulwark.engine.dc.OperatingPoint;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * What every rating rule does: for each part of its kinds that has a limit, take one stress at its worst
 * over all cases and, when it exceeds the limit, report it on the part's designator with the figures.
 * A rule says only which parts, which stress, which limit and in which words.
 */
abstract class PartLimitRule implements Rule {

	/** A part's limit, and the words that say where it comes from ("its rated", "the assumed CMOS"…). */
	record Limit(double value, String basis) {
		static Limit rated(double value) {
			return new Limit(value, "its rated");
		}
	}

	abstract Set<PartKind> kinds();

	/** The limit for this part, or empty when the rule does not check it. */
	abstract Optional<Limit> limit(Part part);

	/** The stress compared with the limit, at one solved case. */
	abstract double stress(OperatingPoint point);

	/** SI unit of the stress and the limit, for the result. */
	abstract String unit();

	abstract String message(Part part, WorstCase worst, Limit limit);

	@Override
	public final void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			if (!kinds().contains(part.getKind())) {
				continue;
			}
			Optional<Limit> limit = limit(part);
			if (limit.isEmpty()) {
				continue;
			}
			Optional<WorstCase> worst = WorstCase.of(context, part.getName(), this::stress);
			if (worst.isPresent() && worst.get().value() > limit.get().value()) {
				RuleInfo info = info();
				findings.accept(new Finding(info.id(), info.concern(), info.severity(),
						message(part, worst.get(), limit.get()), part.getName(), worst.get().caseName(),
						Locations.of(part, DesignPackage.Literals.MEMBER__NAME), worst.get().value(),
						limit.get().value(), unit(), false));
			}
		}
	}
}
