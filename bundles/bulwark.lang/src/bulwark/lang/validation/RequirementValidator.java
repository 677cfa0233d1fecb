package bulwark.lang.validation;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.eclipse.emf.ecore.EPackage;
import org.eclipse.xtext.validation.AbstractDeclarativeValidator;
import org.eclipse.xtext.validation.Check;
import org.eclipse.xtext.validation.EValidatorRegistrar;

import bulwark.lang.design.Design;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Requirement;
import bulwark.lang.units.ScaledUnit;
import bulwark.lang.units.Unit;
import bulwark.lang.units.UnitParser;

/** Checks a design's requirements: known figures, each in a unit of its quantity, each stated once. */
public class RequirementValidator extends AbstractDeclarativeValidator {
	/** The figures a design can require, with the units each may be written in and what the number bounds. */
	public record Figure(String name, List<Unit> units, String meaning) {
	}

	public static final Map<String, Figure> FIGURES = Map.of(
			"threshold", new Figure("threshold", List.of(Unit.OHM), "the indicator is on below this resistance"),
			"test_current", new Figure("test_current", List.of(Unit.AMPERE), "at most this current into a short"),
			"standby_current", new Figure("standby_current", List.of(Unit.AMPERE), "at most this current with the terminals open"),
			"battery_life", new Figure("battery_life", List.of(Unit.HOUR), "at least this long on the battery, terminals open"),
			"hysteresis", new Figure("hysteresis", List.of(Unit.VOLT, Unit.OHM), "at least this much, at the input (V) or the terminals (Ω)"),
			"led_test", new Figure("led_test", List.of(Unit.VOLT), "at least this open-circuit voltage, to light an LED under test"),
			"switch_on_voltage", new Figure("switch_on_voltage", List.of(Unit.VOLT),
					"the indicator is on from at most this DC voltage across the terminals, the first one positive"));

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
	public void requirement(Requirement r) {
		Figure f = FIGURES.get(r.getWhat());
		if (f == null) {
			error("A design can require: " + String.join(", ", FIGURES.keySet().stream().sorted().toList()), r,
					DesignPackage.Literals.REQUIREMENT__WHAT, IssueCodes.UNKNOWN_REQUIREMENT);
			return;
		}
		if (r.getValue() == null || r.getValue().getMagnitude() == null) {
			return;
		}
		Optional<ScaledUnit> u = r.getValue().getUnit() == null ? Optional.empty() : UnitParser.parse(r.getValue().getUnit());
		String units = String.join(" or ", f.units().stream().map(Unit::symbol).toList());
		if (u.isEmpty()) {
			error(r.getWhat() + " is written in " + units + " (" + f.meaning() + ")", r,
					DesignPackage.Literals.REQUIREMENT__VALUE, IssueCodes.MISSING_UNIT);
		} else if (f.units().stream().noneMatch(x -> x.sameQuantity(u.get().unit()))) {
			error(r.getWhat() + " is written in " + units + ", not " + u.get().unit().quantity(), r,
					DesignPackage.Literals.REQUIREMENT__VALUE, IssueCodes.WRONG_UNIT);
		} else if (!(Double.parseDouble(r.getValue().getMagnitude()) > 0)) {
			error(r.getWhat() + " must be more than zero", r, DesignPackage.Literals.REQUIREMENT__VALUE,
					IssueCodes.VALUE_OUT_OF_RANGE);
		}
		if (r.getFrom() != null && r.getFrom() == r.getTo()) {
			error("A requirement is measured between two different terminals", r,
					DesignPackage.Literals.REQUIREMENT__TO, IssueCodes.SAME_TERMINAL);
		}
	}

	@Check
	public void eachOnce(Design design) {
		Set<String> seen = new HashSet<>();
		for (Requirement r : design.getRequirements()) {
			String key = r.getWhat() + "|" + (r.getValue() == null ? "" : unitQuantity(r)) + "|"
					+ (r.getFrom() == null ? "" : r.getFrom().getName() + "-" + r.getTo().getName());
			if (!seen.add(key)) {
				error("'" + r.getWhat() + "' is required twice", r, DesignPackage.Literals.REQUIREMENT__WHAT,
						IssueCodes.DUPLICATE_REQUIREMENT);
			}
		}
	}

	private static String unitQuantity(Requirement r) {
		return UnitParser.parse(r.getValue().getUnit()).map(u -> u.unit().quantity()).orElse("");
	}
}
