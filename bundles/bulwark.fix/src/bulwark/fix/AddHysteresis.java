package bulwark.fix;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import bulwark.check.rules.HysteresisRule;
import bulwark.check.finding.Finding;
import bulwark.check.compile.CompiledDesign;
import bulwark.check.compile.DesignCompiler;
import bulwark.check.parts.Settings;
import bulwark.check.fix.Fix;
import bulwark.check.fix.TextEdit;
import bulwark.check.figures.Figures;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.lang.design.Member;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * Gives a comparator hysteresis: a feedback resistor R2 from its output to its non-inverting input, which
 * already has an input resistor R1 from the signal. When the output swings by VOH, the input steps by
 * VOH·R1/(R1 + R2) (the non-inverting network, docs/sources.md#solver-oracles [closed form]); for a step of at least twice the
 * policy's minimum [common practice: a margin for tolerances], R2 ≤ R1·(VOH/step − 1), taken at or below
 * that on E24. With a feedback resistor already there, its value is lowered instead.
 */
final class AddHysteresis implements FixProvider {
	static final double MARGIN = 2;

	@Override
	public List<Fix> propose(FixContext context, Finding finding) {
		if (!finding.rule().equals(HysteresisRule.ID) || finding.part() == null) {
			return List.of();
		}
		Optional<Part> comparator = PartText.part(context.design(), finding.part());
		if (comparator.isEmpty() || comparator.get().getKind() != PartKind.COMPARATOR) {
			return List.of();
		}
		Part u = comparator.get();
		String out = PartText.netOf(u, "out"), plus = PartText.netOf(u, "in_plus");
		Part feedback = null, input = null;
		for (Member m : context.design().getMembers()) {
			if (m instanceof Part p && p.getKind() == PartKind.RESISTOR) {
				String a = PartText.netOf(p, "a"), b = PartText.netOf(p, "b");
				boolean atPlus = a.equals(plus) || b.equals(plus);
				boolean atOut = a.equals(out) || b.equals(out);
				if (atPlus && atOut) {
					feedback = p;
				} else if (atPlus && input == null) {
					input = p;
				}
			}
		}
		if (input == null) {
			return List.of(); // nothing to divide against: the input needs a resistor first
		}
		double r1 = Settings.parameter(input, "value").orElse(Double.NaN);
		double voh = supply(context, u);
		double step = MARGIN * context.policy().minimumHysteresisVolts().orElse(10e-3);
		if (!(r1 > 0) || !(voh > step)) {
			return List.of();
		}
		double r2 = PreferredValues.atMost(r1 * (voh / step - 1), 24);
		double expected = voh * r1 / (r1 + r2);
		String value = Figures.engineering(r2, "Ω");
		TextEdit edit;
		String label;
		if (feedback == null) {
			String name = PartText.freeName(context.design(), "R_HYST_" + u.getName());
			edit = PartText.insertAfter(context.text(), u, "resistor " + name + " (a: " + out + ", b: " + plus + ") {\n"
					+ PartText.INDENT + "value " + value + " ± 1 %\n" + PartText.INDENT + "package 0805\n" + PartText.INDENT
					+ "rated power 125 mW\n}");
			label = String.format(Locale.ROOT, "add %s = %s from %s's output to in_plus: about %s of hysteresis at its input",
					name, value, u.getName(), Figures.engineering(expected, "V"));
		} else {
			Optional<bulwark.lang.design.Setting> own = PartText.own(feedback, "value", false);
			if (own.isEmpty() || Settings.parameter(feedback, "value").orElse(0.0) <= r2) {
				return List.of();
			}
			edit = PartText.replaceValue(context.text(), own.get(), value);
			label = String.format(Locale.ROOT, "lower %s to %s: about %s of hysteresis at %s's input", feedback.getName(),
					value, Figures.engineering(expected, "V"), u.getName());
		}
		return List.of(new Fix(label, Map.of("feedback_ohms", feedback == null ? Double.POSITIVE_INFINITY
				: Settings.parameter(feedback, "value").orElse(Double.NaN)), Map.of("feedback_ohms", r2,
						"hysteresis_input", expected), List.of(edit)));
	}

	/** The comparator's supply in the normal condition, which its output swings across. */
	private static double supply(FixContext context, Part comparator) {
		CompiledDesign compiled = DesignCompiler.compile(context.design());
		DcResult r = new DcSolver().solve(compiled.circuit());
		if (!(r instanceof DcSolution s)) {
			return Double.NaN;
		}
		var p = s.device(comparator.getName());
		return p.pinVoltage("supply_plus") - p.pinVoltage("supply_minus");
	}
}
