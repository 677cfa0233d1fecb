package bulwark.fix;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import bulwark.check.rules.RatingMissingRule;
import bulwark.check.finding.Finding;
import bulwark.check.finding.FindingDetail;
import bulwark.check.WorstStress;
import bulwark.check.fix.Fix;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * Adds the power rating a resistor lacks: the smallest standard step that holds its worst dissipation with
 * the policy's derating, at least 250 mW [common practice: the usual default of a 1206 or axial part],
 * marked with a comment for the engineer to confirm against the part actually fitted.
 */
final class AddMissingRating implements FixProvider {
	private static final double[] POWER = { 0.25, 0.5, 0.75, 1, 2, 3, 5, 10 };

	@Override
	public List<Fix> propose(FixContext context, Finding finding) {
		boolean lacksPower = finding.detail(FindingDetail.MissingRatings.class).map(m -> m.lacks("power")).orElse(false);
		if (!finding.rule().equals(RatingMissingRule.ID) || finding.part() == null || !lacksPower) {
			return List.of();
		}
		Optional<Part> found = PartText.part(context.design(), finding.part());
		if (found.isEmpty() || found.get().getKind() != PartKind.RESISTOR) {
			return List.of();
		}
		double worst = context.result().stresses().stream()
				.filter(s -> s.part().equals(finding.part()) && s.rating().equals("power")).mapToDouble(WorstStress::value)
				.findFirst().orElse(0);
		double factor = context.policy().derating(PartKind.RESISTOR, "power").factor();
		double step = Double.NaN;
		for (double s : POWER) {
			if (s * factor >= worst) {
				step = s;
				break;
			}
		}
		if (Double.isNaN(step)) {
			return List.of();
		}
		String written = RaiseRating.value(step, "W");
		String setting = "rated power " + written + " # added by a quick fix: confirm against the part fitted";
		return List.of(new Fix("add " + finding.part() + "'s rated power " + written + " (worst dissipation "
				+ bulwark.check.figures.Figures.watts(worst) + "; confirm it)", Map.of("worst", worst),
				Map.of("rated", step), List.of(PartText.addSetting(context.text(), found.get(), setting))));
	}
}
