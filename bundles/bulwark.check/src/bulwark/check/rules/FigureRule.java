package bulwark.check.rules;

import java.util.function.Consumer;

import bulwark.check.finding.Finding;

/**
 * A rule that reads no case of its own: it judges the design and the figures the checker gathers from every
 * case (each part's worst stresses, the function figures), once all are solved.
 */
public interface FigureRule extends Rule {
	void check(CheckContext context, Consumer<Finding> findings);

	@Override
	default RuleReading start(CheckContext context) {
		return findings -> check(context, findings);
	}
}
