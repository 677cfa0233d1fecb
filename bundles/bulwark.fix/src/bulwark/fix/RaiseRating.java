package bulwark.fix;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import bulwark.check.rules.CapacitorVoltageRule;
import bulwark.check.rules.DevicePowerRule;
import bulwark.check.rules.DiodeReverseRule;
import bulwark.check.rules.ForwardCurrentRule;
import bulwark.check.rules.FuseVoltageRule;
import bulwark.check.rules.ProtectorBlockingRule;
import bulwark.check.rules.ResistorPowerRule;
import bulwark.check.rules.SurgeEnergyRule;
import bulwark.check.rules.TransistorCurrentRule;
import bulwark.check.rules.TransistorVoltageRule;
import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleId;
import bulwark.check.parts.Settings;
import bulwark.check.fix.Fix;
import bulwark.check.fix.TextEdit;
import bulwark.check.figures.Figures;
import bulwark.lang.design.Part;
import bulwark.lang.design.Setting;

/**
 * Raises the rating a finding is over to the next standard step that holds the worst stress with the
 * policy's derating: the part's own rating is replaced, or one is added over what its definition says.
 * The steps are the usual catalogue values of each rating [common practice].
 */
final class RaiseRating implements FixProvider {
	private static final Map<String, double[]> STEPS = Map.of(
			"power", new double[] { 0.063, 0.1, 0.125, 0.25, 0.5, 0.75, 1, 2, 3, 5, 10 },
			"reverse", new double[] { 50, 75, 100, 200, 400, 600, 800, 1000, 1500 },
			"forward", new double[] { 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2, 3 },
			"voltage", new double[] { 16, 25, 32, 50, 63, 100, 125, 250, 400, 500, 630, 1000, 2000 },
			"collector_emitter", new double[] { 30, 45, 60, 80, 100, 160, 300, 400, 600 },
			"drain_source", new double[] { 30, 60, 100, 200, 400, 600, 800 },
			"blocking", new double[] { 250, 400, 600, 1000 },
			"collector", new double[] { 0.1, 0.2, 0.5, 1, 2 },
			"drain", new double[] { 0.1, 0.2, 0.5, 1, 2, 5 },
			// single-pulse energy, J: thick-film chips to wirewound and carbon-composition parts
			"pulse", new double[] { 0.05, 0.1, 0.2, 0.5, 1, 2, 5, 10, 20 });
	/** The rules whose findings this fix answers; each finding names the rating it was judged against. */
	private static final Set<RuleId> RAISES = Set.of(ResistorPowerRule.ID, DevicePowerRule.ID, DiodeReverseRule.ID,
			ForwardCurrentRule.ID, CapacitorVoltageRule.ID, FuseVoltageRule.ID, ProtectorBlockingRule.ID,
			TransistorCurrentRule.ID, TransistorVoltageRule.ID, SurgeEnergyRule.ID);

	@Override
	public List<Fix> propose(FixContext context, Finding finding) {
		if (finding.part() == null || finding.value() == null || finding.limit() == null) {
			return List.of();
		}
		Optional<Part> found = PartText.part(context.design(), finding.part());
		if (found.isEmpty()) {
			return List.of();
		}
		Part part = found.get();
		String rating = RAISES.contains(finding.rule()) ? finding.rating() : null;
		if (rating == null || !STEPS.containsKey(rating)) {
			return List.of();
		}
		Optional<Double> rated = Settings.rating(part, rating);
		if (rated.isEmpty()) {
			return List.of();
		}
		double factor = finding.limit() / rated.get(); // the policy's derating, as applied
		double needed = finding.value() / factor;
		double step = Double.NaN;
		for (double s : STEPS.get(rating)) {
			if (s >= needed * (1 + 1e-9) && s > rated.get()) {
				step = s;
				break;
			}
		}
		if (Double.isNaN(step)) {
			return List.of();
		}
		String unit = finding.unit();
		String written = value(step, unit);
		Optional<Setting> own = PartText.own(part, rating, true);
		TextEdit edit = own.isPresent() ? PartText.replaceValue(context.text(), own.get(), written)
				: PartText.addSetting(context.text(), part, "rated " + rating + " " + written);
		String label = String.format(Locale.ROOT, "raise %s's rated %s %s → %s (%.0f %% → %.0f %% of the limit)",
				part.getName(), rating.replace('_', '-'), Figures.engineering(rated.get(), unit), written,
				100 * finding.value() / finding.limit(), 100 * finding.value() / (step * factor));
		return List.of(new Fix(label, Map.of("rated", rated.get(), "utilisation", finding.value() / finding.limit()),
				Map.of("rated", step, "utilisation", finding.value() / (step * factor)), List.of(edit)));
	}

	/** A rating as the design language writes it: "2 W", "250 mW", "1 kV". */
	static String value(double si, String unit) {
		return Figures.engineering(si, unit);
	}
}
