package bulwark.check.rules;

import java.util.Optional;
import bulwark.check.stress.Measure;

/**
 * The largest figure of one stress of one part over all solved cases, the case it happened in, and what the
 * figure is ("power", or "average power over the cycle" under mains).
 */
public record WorstCase(double value, String caseName, String what) {

	public static Optional<WorstCase> of(CheckContext context, String part, Measure stress) {
		return context.worst().of(part, stress).map(w -> new WorstCase(w.value(), w.caseName(), w.what()));
	}
}
