package bulwark.check;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.validation.Issue;

import bulwark.check.compile.CaseRunner;
import bulwark.check.compile.CompiledDesign;
import bulwark.check.compile.DesignCompiler;
import bulwark.check.load.DesignLoader;
import bulwark.check.load.LoadedDesign;
import bulwark.check.policy.DefaultPolicy;
import bulwark.check.policy.PolicyFiles;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.rules.Rule;
import bulwark.check.rules.RuleReading;
import bulwark.check.rules.RuleRegistry;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.SingleFaultRule;
import bulwark.lang.design.Design;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.library.Confinement;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.finding.SourceLocation;
import bulwark.check.finding.Locations;
import bulwark.check.finding.LanguageFindings;
import bulwark.check.load.InputLimits;
import bulwark.check.load.TextFiles;
import bulwark.check.cases.CaseResult;
import bulwark.check.finding.CheckerRules;
import bulwark.check.finding.RuleInfo;
import bulwark.check.budget.Budget;

/**
 * The whole check of one design: language issues first; if the text is sound, every case is solved and
 * every rule runs. A design that cannot be checked ends with status error and a finding saying why.
 */
public final class DesignChecker {
	/** Findings by line, then column; a sort that keeps the order of findings at one place. */
	private static final Comparator<Finding> IN_TEXT_ORDER = Comparator.comparingInt((Finding f) -> f.location().line())
			.thenComparingInt(f -> f.location().column());

	private final DesignLoader loader;
	private final ReviewPolicy forcedPolicy;
	private final PolicyFiles policies;
	private final Duration budget;
	private final List<Rule> rules;
	private final boolean singleFaults;

	public DesignChecker(DesignLoader loader) {
		this(loader, null);
	}

	/**
	 * @param policy the review policy every design is checked under, whatever policy a design names; null to
	 *               use the one a design names, else the built-in policy
	 */
	public DesignChecker(DesignLoader loader, ReviewPolicy policy) {
		this(loader, policy, Budget.DEFAULT);
	}

	/** @param budget the time one design's check may take before it is reported as not checked */
	public DesignChecker(DesignLoader loader, ReviewPolicy policy, Duration budget) {
		this(loader, policy, budget, RuleRegistry.all());
	}

	private DesignChecker(DesignLoader loader, ReviewPolicy policy, Duration budget, List<Rule> rules) {
		this(loader, policy, budget, rules, false);
	}

	private DesignChecker(DesignLoader loader, ReviewPolicy policy, Duration budget, List<Rule> rules,
			boolean singleFaults) {
		this.loader = loader;
		this.forcedPolicy = policy;
		this.policies = new PolicyFiles(loader, RuleRegistry.ids());
		this.budget = budget;
		this.rules = List.copyOf(rules);
		this.singleFaults = singleFaults;
	}

	/**
	 * The same checker with the single-fault analysis asked for in every design's policy (at the severity the
	 * policy gives it, else the rule's own): {@code bulwark check --single-faults}.
	 */
	public DesignChecker withSingleFaults() {
		return new DesignChecker(loader, forcedPolicy, budget, rules, true);
	}

	/**
	 * The same checker running the given rules instead of the registered ones: tests use it to prove that a
	 * rule which crashes is seen as a failure, never as a pass.
	 */
	public DesignChecker withRules(List<Rule> replacement) {
		return new DesignChecker(loader, forcedPolicy, budget, replacement, singleFaults);
	}

	/** The time one design's check may take; the command line gives a design's fix search as long. */
	public Duration budget() {
		return budget;
	}

	/** The loader this checker parses with; quick fixes parse their copies with it. */
	public DesignLoader loader() {
		return loader;
	}

	/** The policy files this checker has read; the command line shares it to read --policy. */
	public PolicyFiles policies() {
		return policies;
	}

	public DesignResult check(Path file) {
		Object read = read(file);
		return read instanceof DesignResult refused ? refused : check((String) read, file.toString(), CancelIndicator.NullImpl);
	}

	/**
	 * The check of a design's text, reading it included in the time budget: a text that takes the whole
	 * budget to parse and validate is not checked, and a fault while reading it stops this design only.
	 */
	public DesignResult check(String text, String file, CancelIndicator cancel) {
		Optional<Finding> refused = InputLimits.check(text);
		if (refused.isPresent()) {
			return notChecked(file, refused.get().message(), refused.get().location());
		}
		Budget.start(budget);
		try {
			LoadedDesign loaded;
			try {
				// validation asks the indicator between its checks: past the budget, it stops there
				loaded = loader.load(text, file, new WithinBudget(cancel));
			} catch (RuntimeException | Error e) {
				if (cancel.isCanceled() && !(e instanceof OutOfMemoryError)) {
					throw e; // the editor has a newer text: this check is dropped, not reported
				}
				return notRead(file, e);
			}
			return guarded(loaded);
		} finally {
			Budget.stop();
		}
	}

	/**
	 * Cancelled when the caller cancels or the budget runs out. A class, not a lambda: this JDK 17's class-data
	 * archive dump (the command line records one on its first run) crashes on a lambda of this interface.
	 */
	private static final class WithinBudget implements CancelIndicator {
		private final CancelIndicator caller;

		WithinBudget(CancelIndicator caller) {
			this.caller = caller;
		}

		@Override
		public boolean isCanceled() {
			return caller.isCanceled() || Budget.overdue();
		}
	}

	/** Why reading a design stopped: its budget, its size, or a fault of ours. */
	private DesignResult notRead(String file, Throwable e) {
		if (Budget.overdue()) {
			return notChecked(file, CheckerRules.BUDGET, String.format(java.util.Locale.ROOT,
					"not checked: the check took longer than its budget of %.3g s (stopped while reading the design)",
					budget.toMillis() / 1000.0));
		}
		if (e instanceof OutOfMemoryError) {
			return notChecked(file, CheckerRules.BUDGET, tooLarge());
		}
		if (e instanceof Error error && !(e instanceof StackOverflowError)) {
			throw error;
		}
		return notChecked(file, CheckerRules.INTERNAL, internal(e));
	}

	/**
	 * The stages every use of a design shares, up to a compiled design under its policy: what solving one case,
	 * a tolerance run and the check itself start from.
	 */
	public Preparation prepare(Path file) {
		Object read = read(file);
		return read instanceof DesignResult refused ? new Preparation.Stopped(refused)
				: prepare((String) read, file.toString(), CancelIndicator.NullImpl);
	}

	/** As {@link #prepare(Path)}, for a design's text as an editor holds it. */
	public Preparation prepare(String text, String file, CancelIndicator cancel) {
		Optional<Finding> refused = InputLimits.check(text);
		if (refused.isPresent()) {
			return new Preparation.Stopped(notChecked(file, refused.get().message(), refused.get().location()));
		}
		return prepare(loader.load(text, file, cancel));
	}

	/** The language's findings, then the policy, then the compiled design; stopped at the first that fails. */
	public Preparation prepare(LoadedDesign loaded) {
		List<Finding> findings = new ArrayList<>();
		boolean languageErrors = false;
		for (Issue issue : loaded.issues()) {
			Finding f = LanguageFindings.of(issue);
			languageErrors |= f.severity() == Severity.ERROR;
			findings.add(f);
		}
		Design design = loaded.design();
		String title = design == null ? null : design.getTitle();
		if (languageErrors || design == null) {
			// in the text's order, as a reader goes through them (the validators report by kind of check)
			findings.sort(IN_TEXT_ORDER);
			return new Preparation.Stopped(new DesignResult(loaded.file(), title, Status.ERROR, findings, List.of()));
		}
		PolicyChoice choice = policyFor(design, loaded.file());
		if (choice.policy() == null) {
			findings.addAll(choice.problems());
			return new Preparation.Stopped(new DesignResult(loaded.file(), title, Status.ERROR, findings, List.of()));
		}
		return new Preparation.Ready(new PreparedDesign(loaded, choice.policy(), DesignCompiler.compile(design), findings));
	}

	/** Where in the file a refusal points (a byte that is not UTF-8), else nowhere in particular. */
	private static SourceLocation at(TextFiles.Refused refused) {
		return refused.line() > 0 ? new SourceLocation(refused.line(), refused.column(), 0, 1) : SourceLocation.NONE;
	}

	/** A design file's text, or (a result of status error) why it is not read. */
	private static Object read(Path file) {
		TextFiles.Read read = TextFiles.read(file, "the design");
		return read instanceof TextFiles.Text t ? t.text()
				: notChecked(file.toString(), ((TextFiles.Refused) read).reason(), at((TextFiles.Refused) read));
	}

	/**
	 * The whole check of a loaded design, within its time budget. A check that runs over, or that meets a
	 * fault of Bulwark's own, ends as not checked with the reason — never as a pass, never stopping a batch.
	 */
	public DesignResult check(LoadedDesign loaded) {
		Budget.start(budget);
		try {
			return guarded(loaded);
		} finally {
			Budget.stop();
		}
	}

	/** The check of a loaded design under the running budget, its faults turned into "not checked". */
	private DesignResult guarded(LoadedDesign loaded) {
		try {
			Budget.checkpoint("reading the design");
			return checkWithinBudget(loaded);
		} catch (Budget.OverBudget e) {
			return notChecked(loaded, CheckerRules.BUDGET, "not checked: " + e.getMessage());
		} catch (RuntimeException e) {
			return notChecked(loaded, CheckerRules.INTERNAL, internal(e));
		} catch (OutOfMemoryError e) {
			// what this design's check allocated is garbage once we return: the other designs of a batch go on
			return notChecked(loaded, CheckerRules.BUDGET, tooLarge());
		}
	}

	private static String internal(Throwable e) {
		return "not checked: Bulwark met a fault of its own (" + e + "); please report it with the design";
	}

	private static String tooLarge() {
		return "not checked: too large — the check of this design needed more than the "
				+ Runtime.getRuntime().maxMemory() / (1024 * 1024) + " MB of memory it runs in";
	}

	private DesignResult checkWithinBudget(LoadedDesign loaded) {
		Preparation prepared = prepare(loaded);
		if (prepared instanceof Preparation.Stopped stopped) {
			return stopped.result();
		}
		PreparedDesign ready = ((Preparation.Ready) prepared).design();
		List<Finding> findings = new ArrayList<>(ready.findings());
		Design design = loaded.design();
		String title = design.getTitle();
		ReviewPolicy policy = singleFaults && !SingleFaultRule.askedFor(ready.policy())
				? ready.policy().withSeverity(SingleFaultRule.ID, Severity.WARNING)
				: ready.policy();
		CompiledDesign compiled = ready.compiled();
		// each case's figures are taken as it is solved, and the case let go (see CaseReading)
		CaseReading reading = new CaseReading(compiled, policy, rules);
		CaseRunner.each(compiled, policy, reading);
		List<CaseResult> caseResults = reading.results();
		List<Finding> failures = reading.failures();
		findings.addAll(failures);
		List<RuleReading> readings = reading.readings();
		for (int i = 0; i < rules.size(); i++) {
			RuleId id = rules.get(i).info().id();
			Budget.checkpoint("rule " + id);
			// a policy's severity replaces the rule's own; otherwise each finding keeps the one its rule gave it
			Severity set = policy.severities().get(id);
			readings.get(i).findings(f -> findings.add(set == null || f.severity() == set ? f : f.withSeverity(set)));
		}
		List<Finding> all = new ArrayList<>(Waivers.apply(design, findings, policy));
		all.sort(IN_TEXT_ORDER);
		Status status = !failures.isEmpty() ? Status.ERROR
				: all.stream().anyMatch(f -> f.severity() == Severity.ERROR && !f.waived()) ? Status.FAIL
						: all.stream().anyMatch(f -> f.rule().equals(bulwark.check.rules.RatingMissingRule.ID) && !f.waived())
								? Status.PASS_UNCHECKED
								: Status.PASS;
		return new DesignResult(loaded.file(), title, status, all, caseResults, policy.title(),
				WorstStresses.of(compiled, reading.worst(), policy), reading.context().function(), reading.traces());
	}

	/** The review policy a design is checked under, or (policy null) the problems that stop its use. */
	public record PolicyChoice(ReviewPolicy policy, List<Finding> problems) {
	}

	/**
	 * The policy given to this checker, else the one the design names (a file beside the design or below
	 * its folder, never outside it), else the built-in one.
	 */
	public PolicyChoice policyFor(Design design, String file) {
		if (forcedPolicy != null) {
			return new PolicyChoice(forcedPolicy, List.of());
		}
		if (design.getPolicy() == null) {
			return new PolicyChoice(DefaultPolicy.POLICY, List.of());
		}
		SourceLocation where = Locations.of(design, DesignPackage.Literals.DESIGN__POLICY);
		Path folder = Path.of(file).toAbsolutePath().getParent();
		Path relative = Confinement.relativeName(design.getPolicy());
		Confinement.Place place = relative == null ? null : Confinement.within(folder, relative);
		if (place == null || place.verdict() == Confinement.Verdict.CLIMBS_OUT) {
			return refused(where, "the review policy must be in the design's folder or below it, not '"
					+ design.getPolicy() + "'");
		}
		if (place.verdict() == Confinement.Verdict.LINKS_OUT) {
			return refused(where, "the review policy '" + design.getPolicy() + "' links outside the design's folder");
		}
		if (place.verdict() == Confinement.Verdict.UNREADABLE) {
			return refused(where, "cannot read the review policy '" + design.getPolicy() + "': " + place.problem());
		}
		Path named = place.file();
		PolicyFiles.Resolution r = policies.read(named);
		if (r.policy().isPresent()) {
			return new PolicyChoice(r.policy().get(), List.of());
		}
		List<Finding> problems = new ArrayList<>();
		for (Finding f : r.problems()) {
			problems.add(f.at(where));
		}
		return new PolicyChoice(null, problems);
	}

	private static PolicyChoice refused(SourceLocation where, String message) {
		return new PolicyChoice(null,
				List.of(Finding.of(CheckerRules.POLICY, message).at(where)));
	}

	/**
	 * Checks a review policy's text as an editor shows it: its language issues and the problems that would
	 * stop its use (an unknown rule), each located in the policy's own text; status error when it cannot be
	 * used, pass otherwise. Nothing is solved.
	 */
	public DesignResult checkPolicy(String text, String file) {
		Optional<Finding> refused = InputLimits.check(text);
		if (refused.isPresent()) {
			return notChecked(file, refused.get().message(), refused.get().location());
		}
		var loaded = loader.loadPolicy(text, file);
		List<Finding> findings = new ArrayList<>();
		for (Issue issue : loaded.issues()) {
			findings.add(LanguageFindings.of(issue));
		}
		String title = loaded.policy() == null ? null : loaded.policy().getTitle();
		if (loaded.policy() != null && findings.stream().noneMatch(f -> f.severity() == Severity.ERROR)) {
			bulwark.check.policy.PolicyCompiler.compile(loaded.policy(), RuleRegistry.ids(), findings::add);
		} else if (loaded.policy() != null) {
			// with the language's errors, the rules it names that do not exist: every mistake at once
			findings.addAll(bulwark.check.policy.PolicyCompiler.unknownRules(loaded.policy(), RuleRegistry.ids()));
		}
		boolean errors = findings.stream().anyMatch(f -> f.severity() == Severity.ERROR) || loaded.policy() == null;
		return new DesignResult(file, title, errors ? Status.ERROR : Status.PASS, findings, List.of());
	}

	/** A design read but whose check stopped (time, memory, a fault of ours): the finding sits on its title. */
	private static DesignResult notChecked(LoadedDesign loaded, RuleInfo rule, String reason) {
		SourceLocation title = loaded.design() == null ? SourceLocation.NONE
				: Locations.of(loaded.design(), DesignPackage.Literals.DOCUMENT__TITLE);
		return notChecked(loaded.file(), rule, reason, title);
	}

	/** A design refused before it was read or checked: one finding saying why, status error. */
	static DesignResult notChecked(String file, String reason, SourceLocation where) {
		return notChecked(file, CheckerRules.FILE, reason, where);
	}

	/** A design whose reading stopped before there was a design to place it on: the finding is at the file's start. */
	private static DesignResult notChecked(String file, RuleInfo rule, String reason) {
		return notChecked(file, rule, reason, new SourceLocation(1, 1, 0, 0));
	}

	private static DesignResult notChecked(String file, RuleInfo rule, String reason, SourceLocation where) {
		return new DesignResult(file, null, Status.ERROR, List.of(Finding.of(rule, reason).at(where)), List.of());
	}
}
