package bulwark.check.rules;

import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import bulwark.check.finding.Concern;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Locations;
import bulwark.check.finding.Severity;
import bulwark.check.parts.Settings;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.stress.Limit;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.check.figures.Figures;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;

/**
 * A resistor absorbs more energy in a pulse than its single-pulse rating, derated by the review policy. The
 * pulses are a surge, ∫ p dt over the solved wave (SurgeRunner); the inrush of mains switched on at the crest,
 * the energy beyond the steady cycle's; and mains through a fuse that opens, ∫ p dt from switching on until
 * the fuse has taken in its pre-arcing I²t (MainsRunner). The rating is what the
 * part's pulse load curve allows for one pulse of about 50 µs, written as {@code rated pulse}; judging a
 * longer pulse against it errs on the safe side, as the curve allows more energy for longer pulses [common
 * practice]. A resistor that absorbs energy in a pulse but has no pulse rating gets a note (info), since its
 * continuous power rating says nothing about a pulse.
 */
public final class SurgeEnergyRule implements FigureRule {
	public static final RuleId ID = RuleId.of("surge-energy");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.POWER, Severity.ERROR,
			"a resistor absorbs more energy in a surge, or before a fuse opens, than its derated single-pulse rating");
	/** Energy below which an unrated resistor is not worth a note: a millijoule [common practice]. */
	static final double NOTEWORTHY_JOULES = 1e-3;

	@Override
	public RuleInfo info() {
		return INFO;
	}

	private record Worst(double joules, String surge) {
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			if (part.getKind() != PartKind.RESISTOR) {
				continue;
			}
			Worst worst = context.worst().pulse(part.getName()).map(w -> new Worst(w.value(), surgeName(w.caseName())))
					.orElse(null);
			if (worst == null) {
				continue;
			}
			Optional<Double> rated = Settings.rating(part, "pulse");
			var where = Locations.of(part, DesignPackage.Literals.MEMBER__NAME);
			if (rated.isEmpty()) {
				if (worst.joules() >= NOTEWORTHY_JOULES) {
					findings.accept(Finding.of(INFO, String.format(Locale.ROOT,
							"%s absorbs %s in '%s' and has no pulse rating, so that is not judged: add 'rated pulse' "
									+ "from its pulse load curve (its power rating is for continuous dissipation)",
							part.getName(), Figures.engineering(worst.joules(), "J"), worst.surge())).withSeverity(Severity.INFO)
							.about(part.getName(), worst.surge(), where).judged(worst.joules(), null, "J"));
				}
				continue;
			}
			ReviewPolicy.Derating d = context.policy().derating(PartKind.RESISTOR, "pulse");
			Limit limit = new Limit(rated.get(), "J", "its rated", d.factor(), d.source());
			if (worst.joules() > limit.value()) {
				findings.accept(Finding.of(INFO, String.format(Locale.ROOT,
						"%s: energy %s in '%s', over %s, %s", part.getName(),
						Figures.over(worst.joules(), limit.value(), "J"), worst.surge(), limit.describe(),
						Figures.ofTheLimit(worst.joules(), limit.value()))).about(part.getName(), worst.surge(), where)
						.judged("pulse", worst.joules(), limit.value(), "J"));
			}
		}
	}

	/** The surge a case instant belongs to: "surge 1 kV behind 2 Ω, TIP + to COM −, at 1.6 µs" without the instant. */
	static String surgeName(String caseName) {
		int at = caseName.lastIndexOf(", at ");
		return at < 0 ? caseName : caseName.substring(0, at);
	}
}
