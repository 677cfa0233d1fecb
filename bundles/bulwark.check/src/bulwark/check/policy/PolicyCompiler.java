package bulwark.check.policy;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Consumer;

import bulwark.check.finding.CheckerRules;
import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.Locations;
import bulwark.check.finding.Severity;
import bulwark.check.policy.ReviewPolicy.Derating;
import bulwark.check.policy.ReviewPolicy.SurgeLevel;
import bulwark.lang.design.DcLevel;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.MainsSystem;
import bulwark.lang.design.Minimum;
import bulwark.lang.design.Policy;
import bulwark.lang.design.PolicyEntry;
import bulwark.lang.design.SampleDistribution;
import bulwark.lang.design.SeverityChange;
import bulwark.lang.design.Surge;
import bulwark.lang.design.WaiverDemand;
import bulwark.lang.units.Quantities;
import bulwark.lang.units.Unit;

/**
 * Resolves a validated policy file over the built-in policy: mains systems listed replace the built-in
 * ones ("mains none" removes them), levels and surges add to none, deratings and severities override one by one, a minimum replaces
 * the built-in minimum, a waiver demand replaces the built-in one. A severity for a rule Bulwark does not
 * have is an error, so that a misspelt rule name cannot pass unseen.
 */
public final class PolicyCompiler {
	private PolicyCompiler() {
	}

	/**
	 * @param rules the rules whose severity a policy may set (the check's registry, passed in so that the
	 *              policy does not depend on the rules)
	 */
	public static ReviewPolicy compile(Policy policy, Set<RuleId> rules, Consumer<Finding> problems) {
		ReviewPolicy base = DefaultPolicy.POLICY;
		List<ReviewPolicy.MainsSystem> mains = new ArrayList<>();
		boolean noMains = false;
		List<Double> levels = new ArrayList<>();
		List<SurgeLevel> surges = new ArrayList<>();
		Map<ReviewPolicy.RatingKey, Derating> derating = new LinkedHashMap<>(base.derating());
		Map<RuleId, Severity> severities = new HashMap<>(base.severities());
		Optional<Double> minVolts = base.minimumHysteresisVolts();
		Optional<Double> minOhms = base.minimumHysteresisOhms();
		boolean needsJustification = base.waiverNeedsJustification(), needsName = base.waiverNeedsName();
		Distribution distribution = base.distribution();
		for (PolicyEntry e : policy.getEntries()) {
			if (e instanceof MainsSystem m && m.isNone()) {
				noMains = true;
			} else if (e instanceof MainsSystem m) {
				double tolerance = m.getTolerance() == null ? 0 : Double.parseDouble(m.getTolerance().getPercent());
				double nominal = si(m.getNominal());
				mains.add(m.getFrequency() == null ? new ReviewPolicy.MainsSystem(nominal, tolerance)
						: new ReviewPolicy.MainsSystem(nominal, tolerance, si(m.getFrequency())));
			} else if (e instanceof DcLevel l) {
				levels.add(si(l.getValue()));
			} else if (e instanceof Surge s) {
				surges.add(new SurgeLevel(si(s.getPeak()), si(s.getResistance())));
			} else if (e instanceof bulwark.lang.design.Derating d) {
				derating.put(ReviewPolicy.key(d.getKind(), d.getRating()), new Derating(
						Double.parseDouble(d.getPercent()) / 100, "review policy '" + policy.getTitle() + "'"));
			} else if (e instanceof Minimum m) {
				double value = si(m.getValue());
				boolean ohms = Quantities.unit(m.getValue()).orElse(Unit.VOLT) == Unit.OHM;
				minVolts = ohms ? Optional.empty() : Optional.of(value);
				minOhms = ohms ? Optional.of(value) : Optional.empty();
			} else if (e instanceof SeverityChange s) {
				RuleId named = rules.stream().filter(r -> r.text().equals(s.getRule())).findFirst().orElse(null);
				if (named == null) {
					problems.accept(unknownRule(s, rules));
				} else {
					severities.put(named, Severity.valueOf(s.getLevel().toUpperCase(Locale.ROOT)));
				}
			} else if (e instanceof SampleDistribution d) {
				distribution = Distribution.of(d.getKind());
			} else if (e instanceof WaiverDemand w) {
				needsJustification = w.getNeeds().contains("justification");
				needsName = w.getNeeds().contains("name");
			}
		}
		return new ReviewPolicy(policy.getTitle(),
				new ReviewPolicy.Abuse(noMains ? List.of() : mains.isEmpty() ? base.mains() : mains, levels, surges), derating,
				new ReviewPolicy.HysteresisMinimum(minVolts, minOhms), severities,
				new ReviewPolicy.WaiverDemands(needsJustification, needsName), distribution);
	}

	private static double si(bulwark.lang.design.Quantity q) {
		return Quantities.si(q).orElseThrow(() -> new IllegalArgumentException("policy quantity without a known unit"));
	}

	/**
	 * The rules a policy names that Bulwark does not have, each located: reported with the policy's other
	 * mistakes, even when those stop it from being compiled, so that one reading shows them all.
	 */
	public static List<Finding> unknownRules(Policy policy, Set<RuleId> rules) {
		List<Finding> unknown = new ArrayList<>();
		for (var e : policy.getEntries()) {
			if (e instanceof SeverityChange s && s.getRule() != null
					&& rules.stream().noneMatch(r -> r.text().equals(s.getRule()))) {
				unknown.add(unknownRule(s, rules));
			}
		}
		return unknown;
	}

	private static Finding unknownRule(SeverityChange s, Set<RuleId> rules) {
		List<String> names = rules.stream().sorted().map(RuleId::text).toList();
		return Finding.of(CheckerRules.POLICY, "the policy sets the severity of '" + s.getRule()
				+ "', which is no rule Bulwark has" + bulwark.lang.naming.Suggestion.didYouMean(s.getRule(), names)
				+ " (rules: " + String.join(", ", names) + ")")
				.at(Locations.of(s, DesignPackage.Literals.SEVERITY_CHANGE__RULE));
	}
}
