package bulwark.fix;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import bulwark.check.finding.Finding;
import bulwark.check.parts.ResistorRatings;
import bulwark.check.parts.Settings;
import bulwark.check.fix.Fix;
import bulwark.check.fix.TextEdit;
import bulwark.check.figures.Figures;
import bulwark.lang.design.Part;
import bulwark.lang.design.Setting;
import bulwark.lang.kinds.KindCatalog;

/**
 * A resistor over its package's limiting element voltage moves to the smallest package, in the order of
 * the language's package list, whose limiting element voltage holds the worst voltage with the policy's
 * derating (typical values, docs/sources.md#resistor-voltage [common practice]). Not offered when the design writes a rated
 * voltage: that is the part's own, for RaiseRating.
 */
final class RaisePackage implements FixProvider {
	@Override
	public List<Fix> propose(FixContext context, Finding finding) {
		Optional<Part> found = PartText.overVoltageResistor(context.design(), finding);
		if (found.isEmpty() || Settings.rating(found.get(), "voltage").isPresent()) {
			return List.of();
		}
		Part part = found.get();
		Optional<String> current = Settings.wordOrNumber(part, "package");
		if (current.isEmpty() || !ResistorRatings.PACKAGE_VOLTS.containsKey(current.get())) {
			return List.of();
		}
		double volts = ResistorRatings.PACKAGE_VOLTS.get(current.get());
		double factor = finding.limit() / volts;
		for (String pkg : KindCatalog.RESISTOR_PACKAGES) {
			double v = ResistorRatings.PACKAGE_VOLTS.get(pkg);
			if (v > volts && v * factor >= finding.value()) {
				Optional<Setting> own = PartText.own(part, "package", false);
				TextEdit edit = own.isPresent() ? PartText.replaceValue(context.text(), own.get(), pkg)
						: PartText.addSetting(context.text(), part, "package " + pkg);
				String label = String.format(Locale.ROOT, "move %s from %s to %s (limiting element voltage %s → %s; %.0f %% → %.0f %% of the limit)",
						part.getName(), current.get().replace('_', ' '), pkg.replace('_', ' '), Figures.engineering(volts, "V"),
						Figures.engineering(v, "V"), 100 * finding.value() / finding.limit(), 100 * finding.value() / (v * factor));
				return List.of(new Fix(label, Map.of("limiting_volts", volts), Map.of("limiting_volts", v), List.of(edit)));
			}
		}
		return List.of();
	}
}
