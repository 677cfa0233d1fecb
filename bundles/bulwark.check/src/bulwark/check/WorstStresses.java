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
		}
		return result;
	}
}
