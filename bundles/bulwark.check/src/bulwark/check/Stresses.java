package bulwark.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import bulwark.check.compile.CompiledDesign;
import bulwark.check.cases.FaultCase;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.stress.Limit;
import bulwark.check.stress.Limits;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.OperatingPoint;
import bulwark.lang.design.Part;
import bulwark.check.cases.PartStress;

/**
 * Every part's figures in one solved case, with its utilisation: the largest of its stresses over the
 * derated limit of the same name (see StressCatalog and Limits), and which rating that was.
 */
final class Stresses {
	private Stresses() {
	}

	static List<PartStress> of(CompiledDesign design, FaultCase c, DcSolution solution,
			java.util.Map<String, Double> averagePower, ReviewPolicy policy) {
		List<PartStress> result = new ArrayList<>();
		for (Part part : design.parts().values()) {
			OperatingPoint p = solution.device(part.getName());
			Double utilisation = null;
			String limiting = null;
			for (Measure m : StressCatalog.of(part.getKind())) {
				Optional<Limit> limit = Limits.of(part, m, policy);
				double figure = m.judged(c, p, averagePower, part.getName());
				if (limit.isPresent() && !Double.isNaN(figure)) {
					double u = figure / limit.get().value();
					if (utilisation == null || u > utilisation) {
						utilisation = u;
						limiting = m.rating();
					}
				}
			}
			result.add(new PartStress(part.getName(), p.voltage(), p.current(), p.power(), utilisation, limiting));
		}
		return result;
	}
}
