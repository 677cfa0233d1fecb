package bulwark.check.rules;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

import bulwark.check.compile.CompiledDesign;
import bulwark.check.function.FunctionFigures;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.stress.WorstFigures;
import bulwark.check.topology.SeriesStrings;
import bulwark.check.topology.SeriesStrings.SeriesString;

/**
 * What a rule may look at: the design, its circuit, the review policy, the series strings of resistors (found
 * once, used by several rules), the function figures, and each part's worst figures over every case — filled
 * in as the cases are solved, complete when a rule is asked for its findings. A rule that must see the cases
 * themselves reads them as they come (see {@link RuleReading}).
 */
public record CheckContext(CompiledDesign design, ReviewPolicy policy, List<SeriesString> seriesStrings,
		Set<String> inSeriesString, FunctionFigures function, WorstFigures worst) {
	public CheckContext {
		seriesStrings = List.copyOf(seriesStrings);
		inSeriesString = Set.copyOf(inSeriesString);
	}

	public static CheckContext of(CompiledDesign design, ReviewPolicy policy, FunctionFigures function,
			WorstFigures worst) {
		List<SeriesString> strings = SeriesStrings.of(design);
		Set<String> members = new HashSet<>();
		strings.forEach(s -> s.resistors().forEach(p -> members.add(p.getName())));
		return new CheckContext(design, policy, strings, members, function, worst);
	}
}
