package bulwark.check.stress;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import bulwark.check.cases.FaultCase;
import bulwark.check.policy.ReviewPolicy;
import bulwark.engine.solve.DcSolution;
import bulwark.lang.design.Part;

/** One stress of one part over its limit in one solved case. */
public record Overstress(Part part, Measure measure, double value, Limit limit) {

	public double utilisation() {
		return value / limit.value();
	}

	/** Every stress over its limit in the solution, for the given parts. */
	public static List<Overstress> in(Iterable<Part> parts, FaultCase c, DcSolution solution,
			java.util.Map<String, Double> averagePower, ReviewPolicy policy) {
		List<Overstress> over = new ArrayList<>();
		for (Part part : parts) {
			for (Measure m : StressCatalog.of(part.getKind())) {
				Optional<Limit> limit = Limits.of(part, m, policy);
				double v = m.judged(c, solution.device(part.getName()), averagePower, part.getName());
				if (limit.isPresent() && !Double.isNaN(v)) {
					if (v > limit.get().value()) {
						over.add(new Overstress(part, m, v, limit.get()));
					}
				}
			}
		}
		return over;
	}
}
