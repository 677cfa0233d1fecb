package bulwark.check.tolerance;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/** The figures of the design at one set of parameter values, or why it could not be solved there. */
public record Evaluation(Map<Figure, Double> figures, String failure) {
	public Evaluation {
		figures = Collections.unmodifiableMap(new LinkedHashMap<>(figures)); // in the order they were found
	}

	public boolean solved() {
		return failure == null;
	}
}
