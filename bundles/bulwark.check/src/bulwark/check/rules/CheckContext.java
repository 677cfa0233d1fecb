package bulwark.check.rules;

import java.util.List;

import bulwark.check.compile.CompiledDesign;

/** What a rule may look at: the design, its circuit, and every case that solved. */
public record CheckContext(CompiledDesign design, List<SolvedCase> cases) {
	public CheckContext {
		cases = List.copyOf(cases);
	}
}
