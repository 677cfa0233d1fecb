package bulwark.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import bulwark.check.compile.CompiledDesign;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.stress.Limit;
import bulwark.check.stress.Limits;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.check.stress.WorstFigures;
import bulwark.lang.design.Part;
import bulwark.check.parts.Settings;
import bulwark.lang.design.PartKind;

/** Each part's worst value of each of its stresses over the solved cases, against its derated limit. */
final class WorstStresses {
	private WorstStresses() {
	}

	static List<WorstStress> of(CompiledDesign design, WorstFigures worst, ReviewPolicy policy) {
		List<WorstStress> result = new ArrayList<>();
		for (Part part : design.parts().values()) {
			for (Measure m : StressCatalog.of(part.getKind())) {
				Optional<WorstFigures.Worst> w = worst.of(part.getName(), m);
				if (w.isEmpty()) {
					continue;
				}
				Optional<Limit> limit = Limits.of(part, m, policy);
				double value = w.get().value();
				result.add(new WorstStress(part.getName(), m.rating(), w.get().what(), m.unit(), value, w.get().caseName(),
						limit.map(Limit::rated).orElse(null), limit.map(Limit::factor).orElse(null),
						limit.map(l -> value / l.value()).orElse(null)));
			}
			pulse(part, worst, policy).ifPresent(result::add);
		}
		return result;
	}

	/**
	 * A resistor's largest pulse energy — a surge, a switch-on inrush, the interval before a fuse opens —
	 * against its derated pulse rating, whether or not it is over it: every judged figure is listed.
	 */
	private static Optional<WorstStress> pulse(Part part, WorstFigures worst, ReviewPolicy policy) {
		Optional<WorstFigures.Worst> w = worst.pulse(part.getName());
		if (part.getKind() != PartKind.RESISTOR || w.isEmpty()) {
			return Optional.empty();
		}
		Optional<Double> rated = Settings.rating(part, "pulse");
		double factor = policy.derating(PartKind.RESISTOR, "pulse").factor();
		double value = w.get().value();
		return Optional.of(new WorstStress(part.getName(), "pulse", "pulse energy", "J", value, w.get().caseName(),
				rated.orElse(null), rated.isPresent() ? factor : null, rated.map(r -> value / (r * factor)).orElse(null)));
	}
}
