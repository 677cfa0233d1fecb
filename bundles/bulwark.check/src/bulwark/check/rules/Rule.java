package bulwark.check.rules;

import bulwark.check.finding.RuleInfo;

/**
 * One check over a solved design. Implementations are stateless and listed in {@link RuleRegistry}; what a
 * rule gathers while a design's cases are solved lives in the reading it starts for that check.
 */
public interface Rule {
	RuleInfo info();

	/**
	 * Begins this rule's part of one design's check, before the first case is solved: the reading is given each
	 * solved case as it comes (the checker keeps none of them), then asked for its findings.
	 */
	RuleReading start(CheckContext context);
}
