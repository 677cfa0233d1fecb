package bulwark.lang.validation;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

import org.eclipse.xtext.validation.Check;
import org.eclipse.xtext.validation.ComposedChecks;

import bulwark.lang.design.Apply;
import bulwark.lang.design.Connect;
import bulwark.lang.design.Definition;
import bulwark.lang.design.Design;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Member;
import bulwark.lang.design.Net;
import bulwark.lang.design.Parameter;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.lang.design.PinBinding;
import bulwark.lang.design.Quantity;
import bulwark.lang.design.Rating;
import bulwark.lang.design.Setting;
import bulwark.lang.design.Short;
import bulwark.lang.design.Terminal;
import bulwark.lang.design.Waiver;
import bulwark.lang.design.Tolerance;
import bulwark.lang.kinds.KindCatalog;
import bulwark.lang.naming.Suggestion;
import bulwark.lang.kinds.KindSpec;
import bulwark.lang.kinds.SettingSpec;
import bulwark.lang.units.ScaledUnit;
import bulwark.lang.units.Unit;
import bulwark.lang.units.UnitParser;

/**
 * Structural checks of a design: every name once, one reference net, each part with exactly the pins of
 * its kind, known parameters and ratings with units of the right quantity. Electrical findings come from
 * the check (bulwark.check), not from here.
 */
@ComposedChecks(validators = { PolicyValidator.class, RequirementValidator.class, LibraryValidator.class })
public class BulwarkValidator extends AbstractBulwarkValidator {

	@Check
	public void namesAreUnique(Design design) {
		Map<String, Member> seen = new HashMap<>();
		for (Member m : design.getMembers()) {
			String name = m.getName();
			if (name == null) {
				continue;
			}
			if (seen.putIfAbsent(name, m) != null) {
				error("The name '" + name + "' is already used on line " + line(seen.get(name)), m,
						DesignPackage.Literals.MEMBER__NAME, IssueCodes.DUPLICATE_NAME);
			}
		}
	}

	@Check
	public void oneReferenceNet(Design design) {
		List<Net> refs = design.getMembers().stream().filter(Net.class::isInstance).map(Net.class::cast)
				.filter(Net::isReference).collect(Collectors.toList());
		if (refs.isEmpty()) {
			error("The design has no reference net: mark the 0 V net, for example 'reference net gnd'", design,
					DesignPackage.Literals.DOCUMENT__TITLE, IssueCodes.NO_REFERENCE_NET);
		}
		for (int i = 1; i < refs.size(); i++) {
			error("Only one net can be the reference; '" + refs.get(0).getName() + "' already is", refs.get(i),
					DesignPackage.Literals.NET__REFERENCE, IssueCodes.MANY_REFERENCE_NETS);
		}
	}

	/**
	 * A net no pin uses is dead text; a net with a single pin and no terminal leads nowhere, which in a
	 * schematic is almost always a wire that was meant to go on. Both are warnings: the design still solves.
	 */
	@Check
	public void netsAreConnected(Design design) {
		Map<Net, Integer> pins = new HashMap<>();
		Set<Net> atTerminals = new HashSet<>();
		for (Member m : design.getMembers()) {
			if (m instanceof Part part) {
				for (PinBinding b : part.getPins()) {
					if (b.getNet() != null && !b.getNet().eIsProxy()) {
						pins.merge(b.getNet(), 1, Integer::sum);
					}
				}
			} else if (m instanceof Terminal t && t.getNet() != null) {
				atTerminals.add(t.getNet());
			}
		}
		for (Member m : design.getMembers()) {
			if (!(m instanceof Net net)) {
				continue;
			}
			int count = pins.getOrDefault(net, 0);
			if (count == 0) {
				warning("Net '" + net.getName() + "' connects no pin" + (atTerminals.contains(net)
						? ": its terminal leads nowhere" : ""), net, DesignPackage.Literals.MEMBER__NAME,
						IssueCodes.UNUSED_NET);
			} else if (count == 1 && !atTerminals.contains(net) && !net.isReference()) {
				warning("Net '" + net.getName() + "' reaches only one pin; was another meant to join it?", net,
						DesignPackage.Literals.MEMBER__NAME, IssueCodes.SINGLE_CONNECTION);
			}
		}
	}

	@Check
	public void pinsMatchKind(Part part) {
		KindSpec spec = KindCatalog.of(part.getKind());
		Set<String> bound = new HashSet<>();
		for (PinBinding b : part.getPins()) {
			if (!spec.pins().contains(b.getPin())) {
				error("A " + spec.kind() + " has no pin '" + b.getPin() + "'" + Suggestion.didYouMean(b.getPin(), spec.pins())
						+ "; its pins are " + String.join(", ", spec.pins()),
						b, DesignPackage.Literals.PIN_BINDING__PIN, IssueCodes.UNKNOWN_PIN);
			} else if (!bound.add(b.getPin())) {
				error("Pin '" + b.getPin() + "' is connected twice", b, DesignPackage.Literals.PIN_BINDING__PIN,
						IssueCodes.DUPLICATE_PIN);
			}
		}
		List<String> missing = spec.pins().stream().filter(p -> !bound.contains(p)).collect(Collectors.toList());
		if (!missing.isEmpty()) {
			error(part.getName() + " leaves pin" + (missing.size() > 1 ? "s " : " ") + String.join(", ", missing)
					+ " unconnected", part, DesignPackage.Literals.MEMBER__NAME, IssueCodes.MISSING_PIN);
		}
	}

	/** A two-pin part with both pins on one net does nothing; almost always a slip of the pen. */
	@Check
	public void notConnectedToItself(Part part) {
		if (part.getPins().size() == 2 && part.getPins().get(0).getNet() != null
				&& part.getPins().get(0).getNet() == part.getPins().get(1).getNet()) {
			warning(part.getName() + " has both pins on net '" + part.getPins().get(0).getNet().getName()
					+ "': it carries nothing and is checked for nothing", part, DesignPackage.Literals.MEMBER__NAME,
					IssueCodes.SELF_CONNECTED);
		}
	}

	@Check
	public void settingsMatchKind(Part part) {
		Set<String> parameters = knownSettings(part.getKind(), part.getSettings());
		// a part made from a definition has the definition's settings too
		if (part.getBase() != null && !part.getBase().eIsProxy()) {
			for (Setting s : part.getBase().getSettings()) {
				if (!(s instanceof Rating)) {
					parameters.add(s.getName());
				}
			}
		}
		for (SettingSpec p : KindCatalog.of(part.getKind()).parameters()) {
			if (p.required() && !parameters.contains(p.name())) {
				error(part.getName() + " needs its " + p.name() + " (" + p.meaning() + ", in " + p.unit().symbol()
						+ ")", part, DesignPackage.Literals.MEMBER__NAME, IssueCodes.MISSING_PARAMETER);
			}
		}
	}

	@Check
	public void definitionSettingsMatchKind(Definition definition) {
		knownSettings(definition.getKind(), definition.getSettings());
	}

	/** Checks each setting against the kind; returns the names of the parameters given. */
	private Set<String> knownSettings(PartKind kind, List<Setting> settings) {
		KindSpec spec = KindCatalog.of(kind);
		Set<String> parameters = new HashSet<>();
		Set<String> ratings = new HashSet<>();
		for (Setting s : settings) {
			boolean isRating = s instanceof Rating;
			Optional<SettingSpec> known = isRating ? spec.rating(s.getName()) : spec.parameter(s.getName());
			if (known.isEmpty() && s.getName() != null) {
				List<SettingSpec> options = isRating ? spec.ratings() : spec.parameters();
				String list = options.isEmpty() ? "none"
						: options.stream().map(SettingSpec::name).collect(Collectors.joining(", "));
				error("A " + spec.kind() + " has no " + (isRating ? "rating" : "parameter") + " '" + s.getName() + "'"
						+ Suggestion.didYouMean(s.getName(), options.stream().map(SettingSpec::name).toList()) + "; it has: "
						+ list, s, DesignPackage.Literals.SETTING__NAME,
						isRating ? IssueCodes.UNKNOWN_RATING : IssueCodes.UNKNOWN_PARAMETER);
				continue;
			}
			if (known.isEmpty()) {
				continue; // a setting without a name: the syntax error says so
			}
			if (!(isRating ? ratings : parameters).add(s.getName())) {
				error("'" + s.getName() + "' is given twice", s, DesignPackage.Literals.SETTING__NAME,
						IssueCodes.DUPLICATE_SETTING);
			}
			checkUnit(s, known.get());
			if (s instanceof Parameter p) {
				checkReason(p);
			}
		}
		return parameters;
	}

	/** A reason belongs to integrity alone, and integrity high needs one: it is a claim a reviewer must read. */
	private void checkReason(Parameter p) {
		boolean integrity = KindCatalog.INTEGRITY.name().equals(p.getName());
		if (integrity && p.getReason() == null) {
			error("integrity high keeps " + "the part out of the single-fault analysis and needs its reason: write integrity high "
					+ "because \"…\"", p, DesignPackage.Literals.SETTING__NAME, IssueCodes.VALUE_OUT_OF_RANGE);
		} else if (!integrity && p.getReason() != null) {
			error("only integrity takes a reason ('because'); " + p.getName() + " does not", p,
					DesignPackage.Literals.PARAMETER__REASON, IssueCodes.UNKNOWN_PARAMETER);
		} else if (integrity && p.getReason().isBlank()) {
			error("integrity high needs a reason that says something", p, DesignPackage.Literals.PARAMETER__REASON,
					IssueCodes.VALUE_OUT_OF_RANGE);
		}
	}

	@Check
	public void applyIsAVoltageBehindAResistance(Apply apply) {
		quantityOf(apply.getValue(), Unit.VOLT, "apply", DesignPackage.Literals.APPLY__VALUE, true);
		if (apply.getFrequency() != null) {
			quantityOf(apply.getFrequency(), Unit.HERTZ, "a sine's frequency", DesignPackage.Literals.APPLY__FREQUENCY,
					false);
		}
		if (apply.getResistance() != null) {
			quantityOf(apply.getResistance(), Unit.OHM, "behind", DesignPackage.Literals.APPLY__RESISTANCE, false);
		}
		distinctTerminals(apply, apply.getFrom(), apply.getTo());
	}

	@Check
	public void connectIsAResistance(Connect connect) {
		quantityOf(connect.getValue(), Unit.OHM, "connect", DesignPackage.Literals.CONNECT__VALUE, false);
		distinctTerminals(connect, connect.getFrom(), connect.getTo());
	}

	@Check
	public void shortJoinsTwoTerminals(Short s) {
		distinctTerminals(s, s.getFrom(), s.getTo());
	}

	private void distinctTerminals(org.eclipse.emf.ecore.EObject action, Terminal from, Terminal to) {
		if (from != null && from == to) {
			error("A case acts between two different terminals", action, null, IssueCodes.SAME_TERMINAL);
		}
	}

	/**
	 * A number the check can compute with: one too large for a double (a 1 followed by 400 zeros, 1e400) or
	 * so small that it reads as nought would become infinity or zero in the solve, so it is refused here, at
	 * its place, rather than later as a fault of no place.
	 */
	@Check
	public void computableNumber(Quantity q) {
		if (q.getMagnitude() == null) {
			return;
		}
		double magnitude = Double.parseDouble(q.getMagnitude());
		double factor = q.getUnit() == null ? 1 : UnitParser.parse(q.getUnit()).map(ScaledUnit::factor).orElse(1.0);
		double si = magnitude * factor;
		String shown = q.getMagnitude().length() > 16 ? q.getMagnitude().substring(0, 12) + "…" : q.getMagnitude();
		if (Double.isInfinite(si)) {
			error("the number " + shown + " is too large to compute with: write it with a prefix or an exponent "
					+ "(at most about 1e300 in SI units)", q, DesignPackage.Literals.QUANTITY__MAGNITUDE,
					IssueCodes.VALUE_OUT_OF_RANGE);
		} else if (si == 0 && q.getMagnitude().split("[eE]")[0].matches(".*[1-9].*")
				|| Math.abs(si) > 0 && Math.abs(si) < 1e-300) {
			error("the number " + shown + " is too small to compute with: write 0, or a value above about 1e-300 "
					+ "in SI units", q, DesignPackage.Literals.QUANTITY__MAGNITUDE, IssueCodes.VALUE_OUT_OF_RANGE);
		}
	}

	/** A case's quantity: its unit (V or Ω), and more than zero unless it may be negative (a voltage). */
	private void quantityOf(Quantity q, Unit unit, String what, org.eclipse.emf.ecore.EStructuralFeature feature,
			boolean mayBeNegative) {
		if (q == null || q.getMagnitude() == null) {
			return;
		}
		Optional<ScaledUnit> u = q.getUnit() == null ? Optional.empty() : UnitParser.parse(q.getUnit());
		if (u.isEmpty()) {
			error(what + " needs a value in " + unit.symbol() + ", for example 1 " + unit.symbol(), q,
					DesignPackage.Literals.QUANTITY__MAGNITUDE, IssueCodes.MISSING_UNIT);
		} else if (!u.get().unit().sameQuantity(unit)) {
			error(what + " takes a " + unit.quantity() + " (" + unit.symbol() + "), not a " + u.get().unit().quantity(),
					q, DesignPackage.Literals.QUANTITY__UNIT, IssueCodes.WRONG_UNIT);
		} else if (!mayBeNegative && !(Double.parseDouble(q.getMagnitude()) > 0)) {
			error(what + " must be more than zero", q, DesignPackage.Literals.QUANTITY__MAGNITUDE,
					IssueCodes.VALUE_OUT_OF_RANGE);
		}
	}

	/**
	 * A waiver is a record for review: it needs a real date (ISO 8601, yyyy-mm-dd). Whether an empty reason
	 * or name is acceptable is the review policy's call, so the check reports those, not the language.
	 */
	@Check
	public void waiverIsComplete(Waiver waiver) {
		try {
			java.time.LocalDate.parse(waiver.getDate());
		} catch (RuntimeException e) {
			error("A waiver's date is written yyyy-mm-dd, for example \"2026-11-30\"", waiver,
					DesignPackage.Literals.WAIVER__DATE, IssueCodes.WAIVER_INCOMPLETE);
		}
	}

	@Check
	public void toleranceInRange(Tolerance tolerance) {
		double percent = Double.parseDouble(tolerance.getPercent());
		if (!(percent >= 0 && percent < 100)) {
			error("A tolerance must be at least 0 % and below 100 %", tolerance,
					DesignPackage.Literals.TOLERANCE__PERCENT, IssueCodes.TOLERANCE_OUT_OF_RANGE);
		}
	}

	private void checkUnit(Setting s, SettingSpec spec) {
		String word = s instanceof Parameter p ? p.getWord() : null;
		if (spec.isWord() || word != null) {
			checkWord(s, spec, word);
			return;
		}
		Quantity q = s.getValue();
		if (q == null || q.getMagnitude() == null) {
			return;
		}
		double value;
		if (spec.unit() == null) {
			if (q.getUnit() != null) {
				error(s.getName() + " is a plain number: write it without a unit", q,
						DesignPackage.Literals.QUANTITY__UNIT, IssueCodes.UNEXPECTED_UNIT);
				return;
			}
			value = Double.parseDouble(q.getMagnitude());
		} else {
			if (q.getUnit() == null) {
				error(s.getName() + " needs its unit: write for example " + q.getMagnitude() + " "
						+ spec.unit().symbol(), q, DesignPackage.Literals.QUANTITY__MAGNITUDE, IssueCodes.MISSING_UNIT);
				return;
			}
			Optional<ScaledUnit> unit = UnitParser.parse(q.getUnit());
			if (unit.isEmpty()) {
				error("'" + q.getUnit() + "' is not a unit Bulwark knows; " + s.getName() + " is in "
						+ spec.unit().symbol(), q, DesignPackage.Literals.QUANTITY__UNIT, IssueCodes.UNKNOWN_UNIT);
				return;
			}
			if (!unit.get().unit().sameQuantity(spec.unit())) {
				error(s.getName() + " is a " + spec.unit().quantity() + " (" + spec.unit().symbol() + "), not a "
						+ unit.get().unit().quantity() + " (" + unit.get().unit().symbol() + ")", q,
						DesignPackage.Literals.QUANTITY__UNIT, IssueCodes.WRONG_UNIT);
				return;
			}
			value = Double.parseDouble(q.getMagnitude()) * unit.get().factor();
		}
		boolean isParameter = s instanceof Parameter;
		boolean mayBeZero = isParameter && ("resistance".equals(s.getName()) || "voltage".equals(s.getName())
				|| "emf".equals(s.getName()) || "position".equals(s.getName()) || "delay".equals(s.getName())
				|| "threshold".equals(s.getName()));
		if ("position".equals(s.getName()) && value > 1) {
			error("position runs from 0 (at a) to 1 (at b)", q, DesignPackage.Literals.QUANTITY__MAGNITUDE,
					IssueCodes.VALUE_OUT_OF_RANGE);
		}
		boolean mayBeNegative = isParameter && ("voltage".equals(s.getName()) || "emf".equals(s.getName()));
		if (value < 0 && !mayBeNegative || value == 0 && !mayBeZero) {
			error(s.getName() + " must be " + (mayBeZero ? "zero or more" : "more than zero"), q,
					DesignPackage.Literals.QUANTITY__MAGNITUDE, IssueCodes.VALUE_OUT_OF_RANGE);
		}
	}

	private void checkWord(Setting s, SettingSpec spec, String word) {
		if (!spec.isWord()) {
			error(s.getName() + " takes a number" + (spec.unit() == null ? "" : " with its unit, for example 1 " + spec.unit().symbol())
					+ ", not '" + word + "'", s, DesignPackage.Literals.PARAMETER__WORD, IssueCodes.UNKNOWN_WORD);
		} else if (word == null) {
			// a package size such as 1206 is read as a number: accept it when it is one of the choices
			Quantity q = s.getValue();
			boolean listedNumber = q != null && q.getUnit() == null && spec.choices().contains(q.getMagnitude());
			if (!listedNumber) {
				error(s.getName() + " is one of: " + String.join(", ", spec.choices()), s,
						DesignPackage.Literals.SETTING__NAME, IssueCodes.UNKNOWN_WORD);
			}
		} else if (!spec.choices().contains(word)) {
			error("'" + word + "' is not a " + s.getName() + " Bulwark knows; it is one of: "
					+ String.join(", ", spec.choices()), s, DesignPackage.Literals.PARAMETER__WORD, IssueCodes.UNKNOWN_WORD);
		}
	}

	private static int line(Member m) {
		var node = org.eclipse.xtext.nodemodel.util.NodeModelUtils.findActualNodeFor(m);
		return node == null ? 0 : node.getStartLine();
	}
}
