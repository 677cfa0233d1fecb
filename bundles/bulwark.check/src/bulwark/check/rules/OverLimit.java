package bulwark.check.rules;

import bulwark.check.Finding;
import bulwark.check.Locations;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;

/** The finding every rating rule makes: a part's worst stress over its limit, on the part's designator. */
final class OverLimit {
	private OverLimit() {
	}

	static Finding of(RuleInfo info, Part part, WorstCase worst, double limit, String unit, String message) {
		return new Finding(info.id(), info.concern(), info.severity(), message, part.getName(), worst.caseName(),
				Locations.of(part, DesignPackage.Literals.MEMBER__NAME), worst.value(), limit, unit, false);
	}
}
