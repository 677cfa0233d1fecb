package bulwark.check.rules;

import java.util.Locale;
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

	/** A comparator input's furthest excursion so far: by how much, where, in which case. */
	private static final class Outside {
		double worst, volts, top;
		String at, pin;
		long order;
	}

	@Override
	public RuleReading start(CheckContext context) {
		java.util.Map<Part, Outside> comparators = new java.util.LinkedHashMap<>();
		for (Part part : context.design().parts().values()) {
			if (part.getKind() == PartKind.COMPARATOR && Settings.rating(part, "headroom").isPresent()) {
				comparators.put(part, new Outside());
			}
		}
		return new RuleReading() {
			@Override
			public void read(long order, SolvedCase c) {
				if (c.faultCase().kind() != bulwark.check.cases.CaseKind.NORMAL) {
					return;
				}
				comparators.forEach((part, o) -> {
					OperatingPoint p = c.solution().device(part.getName());
					double high = p.pinVoltage("supply_plus") - Settings.rating(part, "headroom").get();
					double low = p.pinVoltage("supply_minus");
					for (String pin : new String[] { "in_plus", "in_minus" }) {
						double v = p.pinVoltage(pin);
						double outside = Math.max(v - high, low - v);
						if (outside > o.worst || outside == o.worst && o.at != null && order < o.order) {
							o.worst = outside;
							o.at = c.faultCase().name();
							o.pin = pin;
							o.volts = v;
							o.top = high;
							o.order = order;
						}
					}
				});
			}

			@Override
			public void findings(Consumer<Finding> findings) {
				comparators.forEach((part, o) -> {
					if (o.at != null) {
						findings.accept(Finding.of(INFO, String.format(Locale.ROOT,
								"%s's %s is at %s in case '%s', outside the range its inputs work in (up to %s: the supply "
										+ "less its rated headroom of %s); it no longer compares there",
								part.getName(), o.pin, Figures.engineering(o.volts, "V"), o.at, Figures.engineering(o.top, "V"),
								Figures.engineering(Settings.rating(part, "headroom").get(), "V")))
								.about(part.getName(), o.at, Locations.of(part, DesignPackage.Literals.MEMBER__NAME))
								.judged(o.worst, 0.0, "V"));
					}
				});
			}
		};
	}
}
