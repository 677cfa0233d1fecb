package bulwark.check.rules;

import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import bulwark.check.finding.Concern;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Locations;
import bulwark.check.finding.Severity;
import bulwark.check.parts.Settings;
import bulwark.engine.solve.OperatingPoint;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.check.figures.Figures;
import bulwark.check.cases.SolvedCase;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;

/**
 * In the normal condition, a comparator input outside the range where the comparator works: above its
 * positive supply less its rated headroom, or below its negative supply. Such an input is not damaged, but
 * the comparator no longer compares — the indicator lies. Checked where the design writes
 * {@code rated headroom} (inputs that are not rail to rail); abuse cases are left to comparator-input.
 */
public final class InputRangeRule implements Rule {
	public static final RuleId ID = RuleId.of("input-range");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.COMPARATOR_INPUT, Severity.ERROR,
			"in normal use, a comparator input is outside the range where it works");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			Optional<Double> headroom = Settings.rating(part, "headroom");
			if (part.getKind() != PartKind.COMPARATOR || headroom.isEmpty()) {
				continue;
			}
			double worst = 0;
			String at = null, pinAt = null;
			double volts = 0, top = 0;
			for (SolvedCase c : context.cases()) {
				if (c.faultCase().kind() != bulwark.check.cases.CaseKind.NORMAL) {
					continue;
				}
				OperatingPoint p = c.solution().device(part.getName());
				double high = p.pinVoltage("supply_plus") - headroom.get(), low = p.pinVoltage("supply_minus");
				for (String pin : new String[] { "in_plus", "in_minus" }) {
					double v = p.pinVoltage(pin);
					double outside = Math.max(v - high, low - v);
					if (outside > worst) {
						worst = outside;
						at = c.faultCase().name();
						pinAt = pin;
						volts = v;
						top = high;
					}
				}
			}
			if (at != null) {
				findings.accept(Finding.of(INFO, String.format(Locale.ROOT,
						"%s's %s is at %s in case '%s', outside the range its inputs work in (up to %s: the supply less its "
								+ "rated headroom of %s); it no longer compares there",
						part.getName(), pinAt, Figures.engineering(volts, "V"), at, Figures.engineering(top, "V"),
						Figures.engineering(headroom.get(), "V")))
						.about(part.getName(), at, Locations.of(part, DesignPackage.Literals.MEMBER__NAME))
						.judged(worst, 0.0, "V"));
			}
		}
	}
}
