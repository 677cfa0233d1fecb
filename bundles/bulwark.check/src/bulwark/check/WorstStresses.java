package bulwark.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import bulwark.check.compile.CompiledDesign;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.cases.SolvedCase;
import bulwark.check.stress.Limit;
import bulwark.check.stress.Limits;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.lang.design.Part;
import bulwark.check.parts.Settings;
import bulwark.lang.design.PartKind;

/** Each part's worst value of each of its stresses over the solved cases, against its derated limit. */
final class WorstStresses {
	private WorstStresses() {
	}

	static List<WorstStress> of(CompiledDesign design, List<SolvedCase> cases, ReviewPolicy policy) {
		List<WorstStress> result = new ArrayList<>();
		if (cases.isEmpty()) {
			return result;
		}
		for (Part part : design.parts().values()) {
			for (Measure m : StressCatalog.of(part.getKind())) {
				double worst = Double.NEGATIVE_INFINITY;
				String at = null;
				String what = m.what();
				for (SolvedCase c : cases) {
					double v = m.judged(c, part.getName());
					if (!Double.isNaN(v) && v > worst) {
						worst = v;
						at = c.faultCase().name();
						what = m.what(c.faultCase());
					}
				}
				if (at == null) {
					continue;
				}
				Optional<Limit> limit = Limits.of(part, m, policy);
				double value = worst;
				result.add(new WorstStress(part.getName(), m.rating(), what, m.unit(), value, at,
						limit.map(Limit::rated).orElse(null), limit.map(Limit::factor).orElse(null),
						limit.map(l -> value / l.value()).orElse(null)));
			}
			pulse(part, cases, policy).ifPresent(result::add);
		}
		return result;
	}

	/**
	 * A resistor's largest pulse energy — a surge, a switch-on inrush, the interval before a fuse opens —
	 * against its derated pulse rating, whether or not it is over it: every judged figure is listed.
	 */
	private static Optional<WorstStress> pulse(Part part, List<SolvedCase> cases, ReviewPolicy policy) {
		if (part.getKind() != PartKind.RESISTOR) {
			return Optional.empty();
		}
		double worst = Double.NEGATIVE_INFINITY;
		String at = null;
		for (SolvedCase c : cases) {
			Double e = c.pulseEnergy().get(part.getName());
			if (e != null && e > worst) {
				worst = e;
				at = c.faultCase().name();
			}
		}
		if (at == null) {
			return Optional.empty();
		}
		Optional<Double> rated = Settings.rating(part, "pulse");
		double factor = policy.derating(PartKind.RESISTOR, "pulse").factor();
		double value = worst;
		return Optional.of(new WorstStress(part.getName(), "pulse", "pulse energy", "J", value, at, rated.orElse(null),
				rated.isPresent() ? factor : null, rated.map(r -> value / (r * factor)).orElse(null)));
	}
}
