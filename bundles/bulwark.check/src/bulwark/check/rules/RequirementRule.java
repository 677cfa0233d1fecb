package bulwark.check.rules;

import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.function.Consumer;

import bulwark.check.finding.Concern;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Locations;
import bulwark.check.finding.Severity;
import bulwark.check.finding.SourceLocation;
import bulwark.check.function.FunctionAnalysis;
import bulwark.check.function.FunctionFigures;
import bulwark.check.function.PairFigures;
import bulwark.check.function.SwitchingSweep;
import bulwark.lang.design.Design;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.PartKind;
import bulwark.lang.design.Requirement;
import bulwark.lang.units.Quantities;
import bulwark.lang.units.Unit;
import bulwark.check.figures.Figures;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;

/**
 * The input does what its design requires at the terminals: each {@code require} is compared with the
 * function figure it names (FunctionAnalysis), an error when missed. A battery-powered tester that states
 * none of threshold, test current and battery life is held to the trade's rules of thumb instead — a
 * threshold below about 5 Ω, at most about 20 mA into a short, a year on its battery [common practice,
 * docs/sources.md#tester-inputs] — as warnings. A figure that cannot be computed is said so, never passed silently.
 */
public final class RequirementRule implements FigureRule {
	public static final RuleId ID = RuleId.of("requirement");
	/** Common-practice defaults for battery-powered testers [common practice, docs/sources.md#tester-inputs]. */
	static final double DEFAULT_THRESHOLD_OHMS = 5, DEFAULT_TEST_AMPS = 20e-3,
			DEFAULT_LIFE_SECONDS = FunctionAnalysis.HOURS_PER_YEAR * 3600;
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.REQUIREMENT, Severity.ERROR,
			"the input misses a requirement at its terminals");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		FunctionFigures f = context.function();
		Design design = context.design().design();
		Set<String> stated = new HashSet<>();
		for (Requirement r : design.getRequirements()) {
			stated.add(r.getWhat());
			double value = Quantities.si(r.getValue()).orElseThrow();
			boolean ohms = Quantities.unit(r.getValue()).orElse(null) == Unit.OHM;
			judge(context, f, r.getWhat(), value, ohms, r.getFrom() == null ? null : r.getFrom().getName(),
					r.getTo() == null ? null : r.getTo().getName(), Severity.ERROR, "required",
					Locations.of(r), findings);
		}
		boolean tester = context.design().parts().values().stream().anyMatch(p -> p.getKind() == PartKind.BATTERY);
		if (!tester) {
			return;
		}
		SourceLocation title = Locations.of(design, DesignPackage.Literals.DOCUMENT__TITLE);
		String basis = "common practice for a battery-powered tester";
		// a tester whose indicator never changes state — neither as the resistance across any pair of its
		// terminals goes from a short to an open circuit, nor as a voltage across them rises — shows nothing
		if (f.indicator() != null && !f.pairs().isEmpty() && f.problems().isEmpty()
				&& f.pairs().stream().allMatch(p -> p.risingOhms() == null && p.fallingOhms() == null
						&& p.forward().onVolts() == null && p.reverse().onVolts() == null)) {
			boolean on = f.pairs().get(0).onWhenShorted();
			findings.accept(Finding.of(INFO, String.format(Locale.ROOT, "%s never switches: it stays %s as the resistance "
					+ "across each pair of terminals goes from a short to an open circuit, and as a voltage across them "
					+ "rises to %s either way round, so the tester shows nothing", f.indicator(), on ? "on" : "off",
					Figures.engineering(bulwark.check.function.VoltageSwitching.HIGHEST, "V"))).at(title));
		}
		if (!stated.contains("threshold") && f.pairs().stream().anyMatch(p -> p.thresholdOhms() != null)) {
			judge(context, f, "threshold", DEFAULT_THRESHOLD_OHMS, true, null, null, Severity.WARNING, basis, title, findings);
		}
		if (!stated.contains("test_current") && !f.pairs().isEmpty()) {
			judge(context, f, "test_current", DEFAULT_TEST_AMPS, false, null, null, Severity.WARNING, basis, title, findings);
		}
		if (!stated.contains("battery_life") && f.batteryLifeHours() != null) {
			judge(context, f, "battery_life", DEFAULT_LIFE_SECONDS, false, null, null, Severity.WARNING, basis, title,
					findings);
		}
	}

	private void judge(CheckContext context, FunctionFigures f, String what, double value, boolean ohms, String from,
			String to, Severity severity, String basis, SourceLocation where, Consumer<Finding> findings) {
		List<PairFigures> pairs = f.pairs().stream().filter(p -> from == null || p.from().equals(from) && p.to().equals(to)
				|| p.from().equals(to) && p.to().equals(from)).toList();
		String across = from == null ? "" : " between " + from + " and " + to;
		Optional<Double> figure;
		String unit;
		boolean atMost;
		switch (what) {
		case "threshold":
			figure = pairs.stream().map(PairFigures::thresholdOhms).filter(x -> x != null).findFirst();
			unit = "Ω";
			atMost = true;
			break;
		case "test_current":
			figure = pairs.stream().map(PairFigures::testCurrentAmps).max(Double::compare);
			unit = "A";
			atMost = true;
			break;
		case "standby_current":
			figure = Optional.ofNullable(f.standbyAmps());
			unit = "A";
			atMost = true;
			break;
		case "battery_life":
			figure = Optional.ofNullable(f.batteryLifeHours()).map(h -> h * 3600);
			unit = "s";
			atMost = false;
			break;
		case "led_test":
			figure = pairs.stream().map(p -> Math.abs(p.openVolts())).max(Double::compare);
			unit = "V";
			atMost = false;
			break;
		case "switch_on_voltage":
			// a voltage indicator or logic input: on from this voltage up, the first terminal positive (each
			// terminal with the common one when no pair is named)
			// every pair must come on: one that never does misses the requirement, it is not left out
			List<Double> on = pairs.stream().map(p -> p.withPositive(from == null ? p.from() : from).onVolts()).toList();
			figure = on.isEmpty() || on.contains(null) ? Optional.empty() : on.stream().max(Double::compare);
			unit = "V";
			atMost = true;
			break;
		case "hysteresis":
			if (ohms) {
				figure = pairs.stream().map(PairFigures::hysteresisOhms).filter(x -> x != null).findFirst();
				unit = "Ω";
			} else {
				figure = comparatorStep(context);
				unit = "V";
			}
			atMost = false;
			break;
		default:
			return; // the language reports unknown figures
		}
		String required = (atMost ? "at most " : "at least ") + show(value, unit);
		if (figure.isEmpty()) {
			// a requirement the design states and the input cannot show (it never switches, nothing indicates) is
			// missed, an error; a rule of thumb the design did not ask for is only said to be unchecked
			boolean stated = severity == Severity.ERROR;
			findings.accept(Finding.of(INFO, what.replace('_', ' ') + across + " (" + basis + ": " + required + ")"
					+ (stated ? " is not met: " : " cannot be checked: ") + missing(what, f))
					.withSeverity(stated ? Severity.ERROR : Severity.WARNING).at(where).judged(null, value, unit));
			return;
		}
		double x = figure.get();
		boolean missed = atMost ? x > value : x < value;
		if (missed) {
			findings.accept(Finding.of(INFO,
					String.format(Locale.ROOT, "%s%s is %s, %s %s", what.replace('_', ' '), across, show(x, unit), basis,
							required))
					.withSeverity(severity).at(where).judged(x, value, unit));
		}
	}

	private static Optional<Double> comparatorStep(CheckContext context) {
		return context.function().comparators().values().stream().map(SwitchingSweep.Outcome::result)
				.flatMap(Optional::stream).map(SwitchingSweep.Result::inputStepVolts).findFirst();
	}

	private static String show(double value, String unit) {
		return unit.equals("s") ? String.format(Locale.ROOT, "%.0f h", value / 3600) : Figures.engineering(value, unit);
	}

	private static String missing(String what, FunctionFigures f) {
		if (!f.problems().isEmpty()) {
			return String.join("; ", f.problems());
		}
		return switch (what) {
		case "threshold", "hysteresis" -> f.indicator() == null ? "nothing in the design indicates (no indicator, LED or comparator)"
				: f.indicator() + " does not switch as the resistance across the terminals goes from a short to an open circuit";
		case "standby_current", "battery_life" -> "the design has no battery (or no capacity for it)";
		case "switch_on_voltage" -> f.indicator() == null ? "nothing in the design indicates (no indicator, LED or comparator)"
				: f.pairs().stream().flatMap(p -> java.util.stream.Stream.of(p.forward(), p.reverse()))
						.map(bulwark.check.function.VoltageSwitching::problem).filter(x -> x != null).findFirst()
						.orElse(f.indicator() + " does not come on as a DC voltage across the terminals rises to "
								+ Figures.engineering(bulwark.check.function.VoltageSwitching.HIGHEST, "V"));
		default -> "the design has no terminal pair to measure across";
		};
	}
}
