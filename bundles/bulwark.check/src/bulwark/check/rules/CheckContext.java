package bulwark.check.rules;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

import bulwark.check.compile.CompiledDesign;
import bulwark.check.function.FunctionFigures;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.topology.SeriesStrings;
import bulwark.check.topology.SeriesStrings.SeriesString;
import bulwark.check.cases.SolvedCase;

/**
 * What a rule may look at: the design, its circuit, every case that solved, the review policy, the series
 * strings of resistors (found once, used by several rules) and the function figures.
 */
public record CheckContext(CompiledDesign design, List<SolvedCase> cases, ReviewPolicy policy,
		List<SeriesString> seriesStrings, Set<String> inSeriesString, FunctionFigures function) {
	public CheckContext {
		cases = List.copyOf(cases);
		seriesStrings = List.copyOf(seriesStrings);
		inSeriesString = Set.copyOf(inSeriesString);
	}

	public static CheckContext of(CompiledDesign design, List<SolvedCase> cases, ReviewPolicy policy,
			FunctionFigures function) {
		List<SeriesString> strings = SeriesStrings.of(design);
		Set<String> members = new HashSet<>();
		strings.forEach(s -> s.resistors().forEach(p -> members.add(p.getName())));
		return new CheckContext(design, cases, policy, strings, members, function);
	}
}
