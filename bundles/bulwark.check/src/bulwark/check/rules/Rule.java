package bulwark.check.rules;

import java.util.function.Consumer;

import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleInfo;

/** One check over a solved design. Implementations are stateless and listed in {@link RuleRegistry}. */
public interface Rule {
	RuleInfo info();

	void check(CheckContext context, Consumer<Finding> findings);
}
