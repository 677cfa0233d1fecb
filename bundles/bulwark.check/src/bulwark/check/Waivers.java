package bulwark.check;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.TreeSet;
import java.util.List;
import java.util.Set;

import bulwark.check.policy.ReviewPolicy;
import bulwark.check.rules.Rule;
import bulwark.check.rules.RuleRegistry;
import bulwark.lang.design.Design;
import bulwark.lang.design.Waiver;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.finding.Locations;
import bulwark.check.finding.CheckerRules;

/**
 * Applies a design's waivers (those the review policy accepts: a reason and a name unless it says
 * otherwise): a finding of the waived rule on the waived part stays in every report,
 * marked waived, and no longer fails the design. A waiver that matches nothing, or names a rule Bulwark
 * does not have, is itself reported, so that stale waivers do not pile up unseen.
 */
final class Waivers {

	private Waivers() {
	}

	static List<Finding> apply(Design design, List<Finding> findings, ReviewPolicy policy) {
		List<Finding> result = new ArrayList<>(findings.size());
		Set<Waiver> used = new HashSet<>();
		Set<Waiver> refused = new HashSet<>();
		for (Waiver w : design.getWaivers()) {
			List<String> lacking = new ArrayList<>();
			if (policy.waiverNeedsJustification() && blank(w.getJustification())) {
				lacking.add("a justification");
			}
			if (policy.waiverNeedsName() && blank(w.getWho())) {
				lacking.add("the name of who accepted it");
			}
			if (!lacking.isEmpty()) {
				refused.add(w);
				result.add(Finding.of(CheckerRules.WAIVER, "the waiver of " + w.getRule()
						+ " is not applied: the review policy '" + policy.title() + "' needs " + String.join(" and ", lacking))
						.at(Locations.of(w)));
			}
		}
		for (Finding f : findings) {
			Waiver w = match(design, f);
			if (w != null && refused.contains(w)) {
				w = null;
			}
			if (w != null) {
				used.add(w);
				result.add(f.waivedBy(w.getWho(), w.getDate(), w.getJustification()));
			} else {
				result.add(f);
			}
		}
		Set<String> known = new TreeSet<>();
		for (Rule r : RuleRegistry.all()) {
			known.add(r.info().id().text());
		}
		for (Waiver w : design.getWaivers()) {
			if (!known.contains(w.getRule())) {
				result.add(Finding.of(CheckerRules.WAIVER, "the waiver names no rule Bulwark has: '" + w.getRule()
						+ "' (rules: " + String.join(", ", known) + ")").withSeverity(Severity.WARNING).at(Locations.of(w)));
			} else if (!used.contains(w) && !refused.contains(w)) {
				result.add(Finding.of(CheckerRules.WAIVER, "the waiver of " + w.getRule() + " on " + w.getPart().getName()
						+ " matches no finding; remove it if the design no longer needs it").withSeverity(Severity.WARNING)
						.about(w.getPart().getName(), null, Locations.of(w)));
			}
		}
		return result;
	}

	private static boolean blank(String s) {
		return s == null || s.isBlank();
	}

	private static Waiver match(Design design, Finding f) {
		for (Waiver w : design.getWaivers()) {
			if (f.part() != null && w.getPart() != null && f.rule().text().equals(w.getRule())
					&& f.part().equals(w.getPart().getName())) {
				return w;
			}
		}
		return null;
	}
}
