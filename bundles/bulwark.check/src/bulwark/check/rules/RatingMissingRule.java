package bulwark.check.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import bulwark.check.Concern;
import bulwark.check.Finding;
import bulwark.check.Locations;
import bulwark.check.Severity;
import bulwark.check.stress.Limits;
import bulwark.check.stress.StressCatalog;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;

/**
 * A part lacks a rating that a rating rule needs: that stress cannot be checked, and silence would read as
 * a pass. One warning per part names each missing rating and the rule that therefore does not check it.
 */
public final class RatingMissingRule implements Rule {
	public static final String ID = "rating-missing";
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.RATING_MISSING, Severity.WARNING,
			"a part has no rating to check its stress against");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			List<String> missing = new ArrayList<>();
			for (Rule rule : RuleRegistry.all()) {
				if (rule instanceof PartLimitRule r && r.kinds().contains(part.getKind())) {
					String rating = r.rating(part.getKind());
					var measure = StressCatalog.of(part.getKind(), rating).orElseThrow();
					if (Limits.of(part, measure, context.policy()).isEmpty()
							&& !(rating.equals("voltage") && context.inSeriesString().contains(part.getName()))) {
						missing.add(rating + " (" + r.info().id() + ")");
					}
				}
			}
			// a resistor in a series string needs its voltage limit for series-string
			if (context.inSeriesString().contains(part.getName()) && Limits
					.of(part, StressCatalog.of(part.getKind(), "voltage").orElseThrow(), context.policy()).isEmpty()) {
				missing.add("voltage or package (" + SeriesStringRule.ID + ")");
			}
			if (!missing.isEmpty()) {
				findings.accept(Finding.plain(ID, INFO.concern(), INFO.severity(),
						part.getName() + " has no rating for " + String.join(", ", missing)
								+ ", so that is not checked: add for example '" + example(missing.get(0)) + "'",
						part.getName(), Locations.of(part, DesignPackage.Literals.MEMBER__NAME)));
			}
		}
	}

	private static String example(String missing) {
		String rating = missing.substring(0, missing.indexOf(' '));
		return switch (rating) {
		case "power" -> "rated power 250 mW";
		case "voltage" -> "package 0805";
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
