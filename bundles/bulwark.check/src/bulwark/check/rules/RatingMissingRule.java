package bulwark.check.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import bulwark.check.finding.Concern;
import bulwark.check.finding.Finding;
import bulwark.check.finding.FindingDetail;
import bulwark.check.finding.Locations;
import bulwark.check.finding.Severity;
import bulwark.check.stress.Limits;
import bulwark.check.stress.StressCatalog;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;
import bulwark.check.stress.Measure;

/**
 * A part lacks a rating that a rating rule needs: that stress cannot be checked, and silence would read as
 * a pass. One warning per part names each missing rating and the rule that therefore does not check it.
 */
public final class RatingMissingRule implements FigureRule {
	public static final RuleId ID = RuleId.of("rating-missing");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.RATING_MISSING, Severity.WARNING,
			"a part has no rating to check its stress against");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			List<FindingDetail.Missing> missing = new ArrayList<>();
			for (Rule rule : RuleRegistry.all()) {
				if (rule instanceof PartLimitRule r && r.kinds().contains(part.getKind())) {
					Measure measure = r.measure(part.getKind());
					String rating = measure.rating();
					if (Limits.of(part, measure, context.policy()).isEmpty()
							&& !(rating.equals("voltage") && context.inSeriesString().contains(part.getName()))) {
						missing.add(new FindingDetail.Missing(rating, r.info().id()));
					}
				}
			}
			// a resistor in a series string needs its voltage limit for series-string
			if (context.inSeriesString().contains(part.getName()) && Limits
					.of(part, StressCatalog.VOLTAGE, context.policy()).isEmpty()) {
				missing.add(new FindingDetail.Missing("voltage", SeriesStringRule.ID));
			}
			if (!missing.isEmpty()) {
				List<String> named = missing.stream().map(m -> (m.rule().equals(SeriesStringRule.ID) ? "voltage or package"
						: m.rating()) + " (" + m.rule() + ")").toList();
				findings.accept(Finding.of(INFO, part.getName() + " has no rating for " + String.join(", ", named)
						+ (missing.size() == 1 ? ", so that stress is not checked" : ", so those stresses are not checked")
						+ " and the design can at best pass with unchecked parts: add for example '"
						+ example(part.getKind(), missing.get(0).rating()) + "'")
						.about(part.getName(), null, Locations.of(part, DesignPackage.Literals.MEMBER__NAME))
						.with(new FindingDetail.MissingRatings(missing)));
			}
		}
	}

	private static String example(PartKind kind, String rating) {
		return switch (rating) {
		case "power" -> "rated power 250 mW";
		case "voltage" -> kind == PartKind.RESISTOR ? "package 0805" : "rated voltage 250 V";
		case "gate_source" -> "rated gate_source 20 V";
		case "supply" -> "rated supply 6 V";
		case "current" -> "rated current 500 mA";
		case "reverse" -> "rated reverse 100 V";
		case "forward" -> "rated forward 200 mA";
		case "collector_emitter" -> "rated collector_emitter 45 V";
		case "drain_source" -> "rated drain_source 60 V";
		case "collector" -> "rated collector 100 mA";
		case "drain" -> "rated drain 200 mA";
		case "blocking" -> "rated blocking 400 V";
		case "charge" -> "rated charge 100 mA";
		default -> "rated " + rating + " …";
		};
	}
}
