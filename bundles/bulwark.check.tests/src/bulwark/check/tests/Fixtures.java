package bulwark.check.tests;

import bulwark.check.finding.CheckerRules;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.RuleRegistry;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.eclipse.xtext.util.CancelIndicator;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.load.DesignLoader;
import bulwark.check.policy.DefaultPolicy;
import bulwark.check.policy.PolicyFiles;
import bulwark.check.policy.ReviewPolicy;
import bulwark.lang.BulwarkStandaloneSetup;

/**
 * Checks inline designs. A fixture marks the findings it expects inside its own text: a comment
 * {@code #! rule-id} at the end of a line expects a finding of that rule on that line.
 */
final class Fixtures {
	private static final Pattern MARK = Pattern.compile("#!\\s*([a-z-]+)");
	/**
	 * The design as written: its own cases only (no mains or levels generated), ratings not derated, the
	 * built-in minimum hysteresis — so that a rule's test can compare with a hand calculation of its own case.
	 */
	static final ReviewPolicy AS_WRITTEN = DefaultPolicy.POLICY.with("as written", ReviewPolicy.Abuse.NONE).notDerated();
	private static DesignLoader loader;
	private static DesignChecker asWritten;
	private static DesignChecker underDefault;

	private Fixtures() {
	}

	static synchronized DesignLoader loader() {
		if (loader == null) {
			loader = new DesignLoader(new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration(), installation(List.of()));
		}
		return loader;
	}

	/** The repository as the installation, with the given library folders. */
	static bulwark.lang.install.Installation installation(List<java.nio.file.Path> libraryFolders) {
		return new bulwark.lang.install.Installation(root(), libraryFolders);
	}

	/** A checker of designs as written whose {@code use} also searches the given library folders. */
	static DesignChecker checkerWithLibraries(List<java.nio.file.Path> libraryFolders) {
		return new DesignChecker(new DesignLoader(loader().injector(), installation(libraryFolders)), AS_WRITTEN);
	}

	static synchronized DesignChecker checker() {
		if (asWritten == null) {
			asWritten = new DesignChecker(loader(), AS_WRITTEN);
		}
		return asWritten;
	}

	/** The checker a user gets: the built-in policy, or the one the design names. */
	static synchronized DesignChecker defaultChecker() {
		if (underDefault == null) {
			underDefault = new DesignChecker(loader());
		}
		return underDefault;
	}

	/**
	 * Rules whose findings say the check itself did not finish: a fault of Bulwark's own, a case that did not
	 * solve, a budget run out. A fixture meeting one of them proves nothing about the rule it tests, so the
	 * checks below fail the test on them unless it asks for them with {@link #checkAllowingTrouble}.
	 */
	static final Set<RuleId> TROUBLE = Set.copyOf(CheckerRules.NOT_CHECKED);

	/** Checks the design as written (see {@link #AS_WRITTEN}); fails the test if the check was in trouble. */
	static DesignResult check(String text) {
		return untroubled(checker().check(text, "fixture.bulwark", CancelIndicator.NullImpl));
	}

	/** Checks the design under the built-in review policy: generated abuse cases, derated ratings. */
	static DesignResult checkUnderDefault(String text) {
		return untroubled(defaultChecker().check(text, "fixture.bulwark", CancelIndicator.NullImpl));
	}

	/** Checks the design as written and returns whatever came of it, trouble included. */
	static DesignResult checkAllowingTrouble(String text) {
		return checker().check(text, "fixture.bulwark", CancelIndicator.NullImpl);
	}

	/** Checks the design under the given policy and returns whatever came of it, trouble included. */
	static DesignResult checkAllowingTrouble(String text, ReviewPolicy policy) {
		return new DesignChecker(loader(), policy).check(text, "fixture.bulwark", CancelIndicator.NullImpl);
	}

	/** The result, after failing the test if any finding says the check did not finish (see {@link #TROUBLE}). */
	static DesignResult untroubled(DesignResult result) {
		for (Finding f : result.findings()) {
			if (TROUBLE.contains(f.rule())) {
				throw new AssertionError("the check did not finish (" + f.rule() + "): " + f.message());
			}
		}
		return result;
	}

	/**
	 * Asserts what a "does not trigger" fixture must prove: the design was checked (not refused, every case
	 * solved, at least one case run) and no finding of the rule came of it.
	 */
	static void assertSilent(DesignResult result, RuleId rule) {
		untroubled(result);
		if (result.status() == bulwark.check.Status.ERROR || result.policy() == null) {
			throw new AssertionError("the design was not checked: " + result.findings());
		}
		if (result.cases().isEmpty() || !result.cases().stream().allMatch(c -> c.converged())) {
			throw new AssertionError("not every case solved: " + result.cases());
		}
		List<Finding> of = result.findings().stream().filter(f -> f.rule().equals(rule)).toList();
		if (!of.isEmpty()) {
			throw new AssertionError("expected no " + rule + " finding, got " + of);
		}
	}

	/** The text with {@code from} replaced by {@code to}; fails the test when {@code from} is not in it. */
	static String replaced(String text, String from, String to) {
		if (!text.contains(from)) {
			throw new AssertionError("the fixture has no '" + from + "' to replace");
		}
		return text.replace(from, to);
	}

	/** A review policy from its text; fails the test when the text has errors. */
	static ReviewPolicy policy(String text) {
		PolicyFiles.Resolution r = new PolicyFiles(loader(), RuleRegistry.ids()).parse(text, "fixture.bulwark-policy");
		return r.policy().orElseThrow(() -> new AssertionError("policy has errors: " + r.problems()));
	}

	/** Checks the design under the given policy. */
	static DesignResult check(String text, ReviewPolicy policy) {
		return untroubled(checkAllowingTrouble(text, policy));
	}

	/** "line:rule" for each mark of the given rule in the text. */
	static Set<String> expected(String text, RuleId rule) {
		Set<String> marks = new TreeSet<>();
		String[] lines = text.split("\n", -1);
		for (int i = 0; i < lines.length; i++) {
			Matcher m = MARK.matcher(lines[i]);
			while (m.find()) {
				if (m.group(1).equals(rule.text())) {
					marks.add((i + 1) + ":" + rule);
				}
			}
		}
		return marks;
	}

	/** "line:rule" for each finding of the given rule. */
	static Set<String> actual(DesignResult result, RuleId rule) {
		Set<String> found = new TreeSet<>();
		for (Finding f : result.findings()) {
			if (f.rule().equals(rule)) {
				found.add(f.location().line() + ":" + rule);
			}
		}
		return found;
	}

	static Finding only(DesignResult result, RuleId rule) {
		List<Finding> list = result.findings().stream().filter(f -> f.rule().equals(rule)).toList();
		if (list.size() != 1) {
			throw new AssertionError("expected one " + rule + " finding, got " + result.findings());
		}
		return list.get(0);
	}

	/** The outcomes of the design's cases as the check solves them, under its own policy (for engine-level figures). */
	static java.util.List<bulwark.check.cases.CaseOutcome> outcomes(String text) {
		bulwark.check.Preparation p = checker().prepare(text, "fixture.bulwark", CancelIndicator.NullImpl);
		if (!(p instanceof bulwark.check.Preparation.Ready ready)) {
			throw new AssertionError("not prepared: " + p);
		}
		return bulwark.check.compile.CaseRunner.run(ready.design().compiled(), ready.design().policy());
	}

	static Path root() {
		return Path.of(System.getProperty("bulwark.root", "../.."));
	}
}
