package bulwark.check.function;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The input's function figures: per measuring pair (thresholds, test current, open-circuit voltage), the
 * battery's standby current with the terminals open and the battery life it gives (capacity / standby
 * current; null without a battery or a capacity), which part indicates, and any figure that could not be
 * computed, with the reason.
 */
public record FunctionFigures(String indicator, List<PairFigures> pairs, Double standbyAmps, Double batteryLifeHours,
		Map<String, SwitchingSweep.Outcome> comparators, List<String> problems) {
	public FunctionFigures {
		pairs = List.copyOf(pairs);
		comparators = Collections.unmodifiableMap(new LinkedHashMap<>(comparators));
		problems = List.copyOf(problems);
	}

	public static final FunctionFigures NONE = new FunctionFigures(null, List.of(), null, null, Map.of(), List.of());
}
