package bulwark.check.rules;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.Consumer;

import bulwark.check.finding.Concern;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Locations;
import bulwark.check.finding.Severity;
import bulwark.check.function.SwitchingSweep;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Member;
import bulwark.lang.design.Net;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.lang.design.PinBinding;
import bulwark.check.figures.Figures;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;

/**
 * A comparator without enough hysteresis. First the structure: a positive-feedback path from its output
 * to its non-inverting input through resistors, capacitors or potentiometers (not through the reference,
 * its supplies or a terminal). Without one the output chatters while a slow or noisy input crosses the
 * threshold. With one, the hysteresis is computed by sweeping the resistance across the measuring terminals
 * up and down (SwitchingSweep) and compared with the review policy's minimum: at the input in volts, or
 * at the terminals in ohms, as the policy states it.
 */
public final class HysteresisRule implements FigureRule {
	public static final RuleId ID = RuleId.of("hysteresis");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.HYSTERESIS, Severity.WARNING,
			"a comparator has no hysteresis, or less than the review policy asks for");
	private static final Set<PartKind> PASSIVE = Set.of(PartKind.RESISTOR, PartKind.CAPACITOR, PartKind.POTENTIOMETER,
			PartKind.LINK);

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		for (Part part : context.design().parts().values()) {
			if (part.getKind() != PartKind.COMPARATOR) {
				continue;
			}
			if (!hasFeedback(context, part)) {
				findings.accept(finding(part, part.getName()
						+ " has no positive feedback from out to in_plus, so no hysteresis: its output will chatter while"
						+ " a slow or noisy input crosses the threshold", null, null, null));
				continue;
			}
			SwitchingSweep.Outcome o = context.function().comparators().containsKey(part.getName())
					? context.function().comparators().get(part.getName())
					: SwitchingSweep.of(context.design(), part);
			if (o.failure() != null) {
				findings.accept(finding(part, "the hysteresis of " + part.getName() + " could not be computed: "
						+ o.failure(), null, null, null));
			}
			if (o.result().isEmpty()) {
				continue;
			}
			SwitchingSweep.Result r = o.result().get();
			String figures = String.format(Locale.ROOT, "%s at its input, %s between %s and %s (switching at %s rising, %s falling)",
					Figures.engineering(r.inputStepVolts(), "V"), r.hysteresisOhms() == 0
							? "none within the sweep's 0.1 % resolution" : Figures.engineering(r.hysteresisOhms(), "Ω"), r.from(),
					r.to(), Figures.engineering(r.risingOhms(), "Ω"), Figures.engineering(r.fallingOhms(), "Ω"));
			var policy = context.policy();
			if (policy.minimumHysteresisVolts().isPresent() && r.inputStepVolts() < policy.minimumHysteresisVolts().get()) {
				double min = policy.minimumHysteresisVolts().get();
				findings.accept(finding(part, "the hysteresis of " + part.getName() + " is " + figures
						+ ", below the policy's minimum of " + Figures.engineering(min, "V") + " at the input",
						r.inputStepVolts(), min, "V"));
			} else if (policy.minimumHysteresisOhms().isPresent()
					&& r.hysteresisOhms() < policy.minimumHysteresisOhms().get()) {
				double min = policy.minimumHysteresisOhms().get();
				findings.accept(finding(part, "the hysteresis of " + part.getName() + " is " + figures
						+ ", below the policy's minimum of " + Figures.engineering(min, "Ω") + " at the terminals",
						r.hysteresisOhms(), min, "Ω"));
			}
		}
	}

	private static Finding finding(Part part, String message, Double value, Double limit, String unit) {
		return Finding.of(INFO, message).about(part.getName(), null, Locations.of(part, DesignPackage.Literals.MEMBER__NAME))
				.judged(value, limit, unit);
	}

	/** Whether in_plus can be reached from out through passive parts, avoiding fixed nets. */
	static boolean hasFeedback(CheckContext context, Part comparator) {
		Net out = pin(comparator, "out"), plus = pin(comparator, "in_plus");
		if (out == null || plus == null) {
			return false;
		}
		if (out == plus) {
			return true;
		}
		Set<Net> fixed = new HashSet<>();
		fixed.add(pin(comparator, "supply_plus"));
		fixed.add(pin(comparator, "supply_minus"));
		for (Member m : context.design().design().getMembers()) {
			if (m instanceof Net n && n.isReference() || m instanceof bulwark.lang.design.Terminal) {
				fixed.add(m instanceof Net n ? n : ((bulwark.lang.design.Terminal) m).getNet());
			}
		}
		Set<Net> seen = new HashSet<>(List.of(out));
		Deque<Net> queue = new ArrayDeque<>(List.of(out));
		while (!queue.isEmpty()) {
			Net net = queue.poll();
			for (Part p : context.design().parts().values()) {
				if (!PASSIVE.contains(p.getKind()) || p.getPins().stream().noneMatch(b -> b.getNet() == net)) {
					continue;
				}
				for (PinBinding b : p.getPins()) {
					if (b.getNet() == plus) {
						return true;
					}
					if (!fixed.contains(b.getNet()) && seen.add(b.getNet())) {
						queue.add(b.getNet());
					}
				}
			}
		}
		return false;
	}

	private static Net pin(Part part, String name) {
		return part.getPins().stream().filter(b -> name.equals(b.getPin())).map(PinBinding::getNet).findFirst()
				.orElse(null);
	}
}
