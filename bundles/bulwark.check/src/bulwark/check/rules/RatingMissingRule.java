package bulwark.check.rules;

import java.util.function.Consumer;

import bulwark.check.Concern;
import bulwark.check.Finding;
import bulwark.check.Locations;
import bulwark.check.Severity;
import bulwark.check.compile.Settings;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * A resistor without a power rating: its dissipation cannot be checked, and silence would read as a pass.
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
			if (part.getKind() == PartKind.RESISTOR && Settings.rating(part, "power").isEmpty()) {
				findings.accept(Finding.plain(ID, INFO.concern(), INFO.severity(), part.getName()
						+ " has no power rating, so its dissipation is not checked: add for example 'rated power 250 mW'",
						part.getName(), Locations.of(part, DesignPackage.Literals.MEMBER__NAME)));
			}
		}
	}
}
