package bulwark.check.rules;

import java.util.Optional;
import bulwark.check.stress.Measure;

/** The largest value of one stress of one part over all solved cases, and the case it happened in. */
public record WorstCase(double value, String caseName) {

	public static Optional<WorstCase> of(CheckContext context, String part, Measure stress) {
		WorstCase worst = null;
		for (SolvedCase c : context.cases()) {
			if (!stress.appliesIn(c.faultCase(), part)) {
				continue;
			}
			double v = stress.of(c.solution().device(part));
			if (worst == null || v > worst.value) {
				worst = new WorstCase(v, c.faultCase().name());
			}
		}
		return Optional.ofNullable(worst);
	}
}
