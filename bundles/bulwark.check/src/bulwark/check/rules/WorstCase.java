package bulwark.check.rules;

import java.util.Optional;
import java.util.function.ToDoubleFunction;

import bulwark.engine.dc.OperatingPoint;

/** The largest value of one stress of one part over all solved cases, and the case it happened in. */
public record WorstCase(double value, String caseName) {

	public static Optional<WorstCase> of(CheckContext context, String part, ToDoubleFunction<OperatingPoint> stress) {
		WorstCase worst = null;
		for (SolvedCase c : context.cases()) {
			double v = stress.applyAsDouble(c.solution().device(part));
			if (worst == null || v > worst.value) {
				worst = new WorstCase(v, c.faultCase().name());
			}
		}
		return Optional.ofNullable(worst);
	}
}
