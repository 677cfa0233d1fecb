package bulwark.check.finding;

import java.util.List;

/**
 * The findings the check makes itself, besides its rules — the text does not parse, the file is refused, a
 * case does not solve, the time budget ran out, Bulwark met a fault of its own — registered as rules so that
 * reports list them, waivers and tests name them by constant, and none is written by hand twice.
 */
public final class CheckerRules {
	public static final RuleInfo SYNTAX = new RuleInfo("syntax", Concern.SYNTAX, Severity.ERROR,
			"the design text does not parse");
	public static final RuleInfo STRUCTURE = new RuleInfo("structure", Concern.STRUCTURE, Severity.ERROR,
			"the text parses but is not a valid design");
	public static final RuleInfo FILE = new RuleInfo("file", Concern.STRUCTURE, Severity.ERROR,
			"the file could not be read or is refused");
	public static final RuleInfo POLICY = new RuleInfo("policy", Concern.STRUCTURE, Severity.ERROR,
			"the review policy cannot be used");
	public static final RuleInfo WAIVER = new RuleInfo("waiver", Concern.STRUCTURE, Severity.ERROR,
			"a waiver is stale, unknown or lacks what the policy needs");
	public static final RuleInfo SOLVER = new RuleInfo("solver", Concern.SOLVER, Severity.ERROR,
			"a case could not be solved");
	public static final RuleInfo BUDGET = new RuleInfo("budget", Concern.SOLVER, Severity.ERROR,
			"the check took longer than its time budget");
	public static final RuleInfo INTERNAL = new RuleInfo("internal", Concern.SOLVER, Severity.ERROR,
			"the check met a fault of its own");
	public static final RuleInfo OMITTED = new RuleInfo("omitted", Concern.STRUCTURE, Severity.INFO,
			"a design has more findings than a report lists");
	/** In report order. */
	public static final List<RuleInfo> ALL = List.of(SYNTAX, STRUCTURE, FILE, POLICY, WAIVER, SOLVER, BUDGET, INTERNAL,
			OMITTED);
	/** Findings that mean the design was not (fully) checked: never part of a pass. */
	public static final List<RuleId> NOT_CHECKED = List.of(SOLVER.id(), BUDGET.id(), INTERNAL.id());

	private CheckerRules() {
	}
}
