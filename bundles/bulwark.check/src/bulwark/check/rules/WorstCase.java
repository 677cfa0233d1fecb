package bulwark.check.rules;

import java.util.Optional;
import bulwark.check.stress.Measure;
import bulwark.check.cases.SolvedCase;

/**
 * The largest figure of one stress of one part over all solved cases, the case it happened in, and what the
 * figure is ("power", or "average power over the cycle" under mains).
 */
public record WorstCase(double value, String caseName, String what) {

	public static Optional<WorstCase> of(CheckContext context, String part, Measure stress) {
		WorstCase worst = null;
		for (SolvedCase c : context.cases()) {
			double v = stress.judged(c, part);
			if (!Double.isNaN(v) && (worst == null || v > worst.value)) {
				worst = new WorstCase(v, c.faultCase().name(), stress.what(c.faultCase()));
			}
		}
		return Optional.ofNullable(worst);
	}
}
