package bulwark.fix;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import bulwark.check.rules.PreferredValueRule;
import bulwark.check.finding.Finding;
import bulwark.check.fix.Fix;
import bulwark.check.figures.Figures;
import bulwark.lang.design.Parameter;
import bulwark.lang.design.Part;
import bulwark.lang.design.Setting;

/** Snaps a value to the nearest of its IEC 60063 series, keeping the tolerance as written. */
final class SnapValue implements FixProvider {
	@Override
	public List<Fix> propose(FixContext context, Finding finding) {
		if (!finding.rule().equals(PreferredValueRule.ID) || finding.limit() == null || finding.part() == null) {
			return List.of();
		}
		Optional<Part> part = PartText.part(context.design(), finding.part());
		Optional<Setting> own = part.flatMap(p -> PartText.own(p, "value", false));
		if (own.isEmpty() || !(own.get() instanceof Parameter p) || p.getValue() == null) {
			return List.of();
		}
		String value = Figures.engineering(finding.limit(), finding.unit());
		return List.of(new Fix("snap " + finding.part() + " to " + value, Map.of("value", finding.value()),
				Map.of("value", finding.limit()), List.of(PartText.replaceValue(context.text(), own.get(), value))));
	}
}
