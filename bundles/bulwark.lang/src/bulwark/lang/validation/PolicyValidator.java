package bulwark.lang.validation;

import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.xtext.validation.AbstractDeclarativeValidator;
import org.eclipse.xtext.validation.Check;
import org.eclipse.xtext.validation.EValidatorRegistrar;

import bulwark.lang.design.DcLevel;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Derating;
import bulwark.lang.design.MainsSystem;
import bulwark.lang.design.Minimum;
import bulwark.lang.design.Quantity;
import bulwark.lang.design.SampleDistribution;
import bulwark.lang.design.SeverityChange;
import bulwark.lang.design.Surge;
import bulwark.lang.design.WaiverDemand;
import bulwark.lang.kinds.KindCatalog;
import bulwark.lang.naming.Suggestion;
import bulwark.lang.kinds.KindSpec;
import bulwark.lang.kinds.SettingSpec;
import bulwark.lang.units.ScaledUnit;
import bulwark.lang.units.Unit;
import bulwark.lang.units.UnitParser;

/**
 * Checks of a review policy's entries: quantities in their units, derating of ratings a kind has, known
 * severities and waiver demands. Which rules exist is known to the check, which reports unknown rule names.
 */
public class PolicyValidator extends AbstractDeclarativeValidator {
	/** The severities a policy may give a rule: raised or lowered, never switched off. */
	public static final List<String> SEVERITIES = List.of("error", "warning", "info");
	/** What a policy may demand of every waiver. */
	public static final List<String> WAIVER_NEEDS = List.of("justification", "name", "nothing");
	/** The minimums a policy may set, each in one of the units listed with it. */
	public static final List<String> MINIMUMS = List.of("hysteresis");
	/** How Monte Carlo draws toleranced values. */
	public static final List<String> DISTRIBUTIONS = List.of("uniform", "normal");

	/**
	 * Composed into BulwarkValidator (@ComposedChecks), which registers the checks: registering this one for
	 * the package too would run each of its checks twice and report every problem twice.
	 */
	@Override
	public void register(EValidatorRegistrar registrar) {
	}

	@Override
	protected List<EPackage> getEPackages() {
		return List.of(DesignPackage.eINSTANCE);
	}

	@Check
	public void mains(MainsSystem mains) {
		positive(mains.getNominal(), "mains", DesignPackage.Literals.MAINS_SYSTEM__NOMINAL, Unit.VOLT);
		positive(mains.getFrequency(), "the mains frequency", DesignPackage.Literals.MAINS_SYSTEM__FREQUENCY, Unit.HERTZ);
	}

	@Check
	public void level(DcLevel level) {
		positive(level.getValue(), "level", DesignPackage.Literals.DC_LEVEL__VALUE, Unit.VOLT);
	}

	@Check
	public void surge(Surge surge) {
		positive(surge.getPeak(), "surge", DesignPackage.Literals.SURGE__PEAK, Unit.VOLT);
		positive(surge.getResistance(), "behind", DesignPackage.Literals.SURGE__RESISTANCE, Unit.OHM);
	}

	@Check
	public void derating(Derating d) {
		KindSpec spec = KindCatalog.of(d.getKind());
		if (d.getRating() != null && spec.rating(d.getRating()).isEmpty()) {
			String list = spec.ratings().stream().map(SettingSpec::name).collect(Collectors.joining(", "));
			error("A " + spec.kind() + " has no rating '" + d.getRating() + "'"
					+ Suggestion.didYouMean(d.getRating(), spec.ratings().stream().map(SettingSpec::name).toList()) + "; it has: "
					+ (list.isEmpty() ? "none" : list), d, DesignPackage.Literals.DERATING__RATING, IssueCodes.UNKNOWN_RATING);
		}
		if (d.getPercent() != null) {
			double percent = Double.parseDouble(d.getPercent());
			if (!(percent > 0 && percent <= 100)) {
				error("A derating keeps more than 0 % and at most 100 % of the rating", d,
						DesignPackage.Literals.DERATING__PERCENT, IssueCodes.VALUE_OUT_OF_RANGE);
			}
		}
	}

	@Check
	public void minimum(Minimum m) {
		if (!MINIMUMS.contains(m.getWhat())) {
			error("A policy sets a minimum for: " + String.join(", ", MINIMUMS), m,
					DesignPackage.Literals.MINIMUM__WHAT, IssueCodes.UNKNOWN_WORD);
			return;
		}
		Optional<ScaledUnit> u = unit(m.getValue());
		if (u.isEmpty() || u.get().unit() != Unit.VOLT && u.get().unit() != Unit.OHM) {
			error("The minimum hysteresis is a voltage at the comparator input (for example 10 mV) or a resistance "
					+ "at the terminals (for example 0.5 Ω)", m, DesignPackage.Literals.MINIMUM__VALUE, IssueCodes.WRONG_UNIT);
		}
	}

	@Check
	public void severity(SeverityChange s) {
		if (!SEVERITIES.contains(s.getLevel())) {
			error("A rule's severity is one of: " + String.join(", ", SEVERITIES)
					+ " (a rule can be lowered, never switched off)", s, DesignPackage.Literals.SEVERITY_CHANGE__LEVEL,
					IssueCodes.UNKNOWN_WORD);
		}
	}

	@Check
	public void waiverDemand(WaiverDemand w) {
		for (int i = 0; i < w.getNeeds().size(); i++) {
			if (!WAIVER_NEEDS.contains(w.getNeeds().get(i))) {
				error("Waivers can be made to need: " + String.join(", ", WAIVER_NEEDS), w,
						DesignPackage.Literals.WAIVER_DEMAND__NEEDS, i, IssueCodes.UNKNOWN_WORD);
			}
		}
	}

	@Check
	public void distribution(SampleDistribution d) {
		if (!DISTRIBUTIONS.contains(d.getKind())) {
			error("A distribution is one of: " + String.join(", ", DISTRIBUTIONS), d,
					DesignPackage.Literals.SAMPLE_DISTRIBUTION__KIND, IssueCodes.UNKNOWN_WORD);
		}
	}

	private void positive(Quantity q, String what, EStructuralFeature feature, Unit expected) {
		if (q == null || q.getMagnitude() == null) {
			return;
		}
		Optional<ScaledUnit> u = unit(q);
		if (u.isEmpty()) {
			error(what + " needs a value in " + expected.symbol() + ", for example 1 " + expected.symbol(), q.eContainer(),
					feature, IssueCodes.MISSING_UNIT);
		} else if (!u.get().unit().sameQuantity(expected)) {
			error(what + " takes a " + expected.quantity() + " (" + expected.symbol() + "), not a "
					+ u.get().unit().quantity(), q.eContainer(), feature, IssueCodes.WRONG_UNIT);
		} else if (!(Double.parseDouble(q.getMagnitude()) > 0)) {
			error(what + " must be more than zero", q.eContainer(), feature, IssueCodes.VALUE_OUT_OF_RANGE);
		}
	}

	private static Optional<ScaledUnit> unit(Quantity q) {
		return q == null || q.getUnit() == null ? Optional.empty() : UnitParser.parse(q.getUnit());
	}
}
