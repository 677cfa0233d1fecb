package bulwark.check.rules;

import java.util.Locale;
import java.util.function.Consumer;

import bulwark.check.finding.Concern;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Locations;
import bulwark.check.finding.Severity;
import bulwark.check.parts.Settings;
import bulwark.check.series.Iec60063;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Parameter;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.lang.design.Setting;
import bulwark.check.figures.Figures;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;

/**
 * A resistor's or capacitor's value is in neither the IEC 60063 series of its tolerance (E24 for ±5 %, E96
 * for ±1 % …) nor a coarser one (a ±1 % part comes in E24 values too): such a part is not stocked, and the
 * value was probably computed and never rounded. Information,
 * with the nearest value; the quick fix snaps to it when the design still passes.
 */
public final class PreferredValueRule implements FigureRule {
	public static final RuleId ID = RuleId.of("preferred-value");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.STRUCTURE, Severity.INFO,
			"a value is not in the preferred series of its tolerance");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			if (part.getKind() != PartKind.RESISTOR && part.getKind() != PartKind.CAPACITOR) {
				continue;
			}
			for (Setting s : Settings.all(part)) {
				if (s instanceof Parameter p && p.getName().equals("value") && p.getTolerance() != null) {
					double tolerance = Double.parseDouble(p.getTolerance().getPercent());
					int n = Iec60063.seriesFor(tolerance);
					double value = Settings.parameter(part, "value").orElseThrow();
					if (!Iec60063.stocked(value, tolerance)) {
						String unit = part.getKind() == PartKind.RESISTOR ? "Ω" : "F";
						double nearest = Iec60063.nearestStocked(value, tolerance);
						findings.accept(Finding.of(INFO, String.format(Locale.ROOT, "%s = %s is not a value of E%d (the series of ±%s %%) or a coarser series; the nearest is %s",
										part.getName(), Figures.engineering(value, unit), n, p.getTolerance().getPercent(),
										Figures.engineering(nearest, unit)))
								.about(part.getName(), null, Locations.of(part, DesignPackage.Literals.MEMBER__NAME))
								.judged(value, nearest, unit));
					}
					break;
				}
			}
		}
	}
}
