package bulwark.fix;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import bulwark.check.rules.ClampCurrentRule;
import bulwark.check.rules.ComparatorInputRule;
import bulwark.check.finding.Finding;
import bulwark.check.fix.Fix;
import bulwark.check.fix.TextEdit;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * Limits a comparator input's clamp current with a resistor in series with the input: the candidates run
 * up the E3 steps of a decade ladder (10 kΩ … 1 MΩ) in a 1206 part rated 250 mW — high enough for the
 * clamp, low enough for the input's own current [common practice] — and the re-check keeps the first
 * that brings the clamp current within its limit without overstressing the new resistor.
 */
final class LimitClampCurrent implements FixProvider {
	static final double[] OHMS = { 10e3, 22e3, 47e3, 100e3, 220e3, 470e3, 1e6 };

	@Override
	public List<Fix> propose(FixContext context, Finding finding) {
		if (!finding.rule().equals(ClampCurrentRule.ID) && !finding.rule().equals(ComparatorInputRule.ID) || finding.part() == null) {
			return List.of();
		}
		Optional<Part> found = PartText.part(context.design(), finding.part());
		if (found.isEmpty() || found.get().getKind() != PartKind.COMPARATOR) {
			return List.of();
		}
		Part u = found.get();
		List<Fix> fixes = new ArrayList<>();
		for (String pin : new String[] { "in_plus", "in_minus" }) {
			String old = PartText.netOf(u, pin);
			String net = PartText.freeName(context.design(), u.getName() + "_" + pin.toUpperCase(java.util.Locale.ROOT));
			String name = PartText.freeName(context.design(), "R_CLAMP_" + u.getName());
			for (double ohms : OHMS) {
				String value = RaiseRating.value(ohms, "Ω");
				TextEdit resistor = PartText.insertAfter(context.text(), u, "resistor " + name + " (a: " + old + ", b: " + net
						+ ") {\n" + PartText.INDENT + "value " + value + " ± 1 %\n" + PartText.INDENT + "package 1206\n"
						+ PartText.INDENT + "rated power 250 mW\n}");
				TextEdit repoint = PartText.repoint(context.text(), u, pin, net);
				TextEdit declare = PartText.addNet(context.text(), context.design(), net);
				fixes.add(new Fix("put " + name + " = " + value + " in series with " + u.getName() + "'s " + pin
						+ " to limit its clamp current", Map.of("clamp_amps", finding.value() == null ? Double.NaN : finding.value()),
						Map.of("series_ohms", ohms), Edits.backwards(resistor, repoint, declare)));
			}
		}
		return fixes;
	}
}
