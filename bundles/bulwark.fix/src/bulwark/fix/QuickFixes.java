package bulwark.fix;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.eclipse.xtext.util.CancelIndicator;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.fix.Fix;
import bulwark.check.load.LoadedDesign;
import bulwark.check.policy.ReviewPolicy;

/**
 * The fixes Bulwark offers for a design's findings, the same to the workbench, the language server and the
 * command line. Every proposal is applied to a copy of the text and the copy checked again with every rule:
 * a fix is offered only when the finding it targets is gone and no new error appears.
 */
public final class QuickFixes {
	private static final List<FixProvider> PROVIDERS = List.of(new RaiseRating(), new RaisePackage(), new SplitResistor(),
			new AddMissingRating(), new AddHysteresis(), new LimitClampCurrent(), new BlockReversePath(), new SnapValue());
	/** Proposals of one provider for one finding after the first verified one are not tried. */
	private static final boolean FIRST_ONLY = true;

	private QuickFixes() {
	}

	/**
	 * The fixes found for a design's findings; {@code complete} false when the search stopped at its time
	 * limit, so that the findings after that point may have fixes that were not looked for.
	 */
	public record Search(Map<Finding, List<Fix>> fixes, boolean complete) {
	}

	/** The verified fixes of each finding that has any, in the order of the findings. */
	public static Map<Finding, List<Fix>> of(DesignChecker checker, String text, String file, DesignResult result) {
		return search(checker, text, file, result, null).fixes();
	}

	/**
	 * As {@link #of}, trying proposals only until {@code limit} has passed (null: no limit): each proposal is
	 * a whole check of the changed design, and a design with many terminals takes seconds a check.
	 */
	public static Search search(DesignChecker checker, String text, String file, DesignResult result,
			java.time.Duration limit) {
		long deadline = limit == null ? Long.MAX_VALUE : System.nanoTime() + limit.toNanos();
		Map<Finding, List<Fix>> fixes = new LinkedHashMap<>();
		LoadedDesign loaded = checker.loader().load(text, file, CancelIndicator.NullImpl);
		if (loaded.design() == null || result.policy() == null) {
			return new Search(fixes, true);
		}
		ReviewPolicy policy = checker.policyFor(loaded.design(), file).policy();
		if (policy == null) {
			return new Search(fixes, true);
		}
		FixContext context = new FixContext(text, file, loaded.design(), result, policy, checker);
		Set<String> errorsBefore = keys(result, Severity.ERROR);
		for (Finding f : result.findings()) {
			if (f.waived()) {
				continue;
			}
			List<Fix> verified = new ArrayList<>();
			for (FixProvider provider : PROVIDERS) {
				for (Fix fix : provider.propose(context, f)) {
					if (System.nanoTime() > deadline) {
						if (!verified.isEmpty()) {
							fixes.put(f, verified);
						}
						return new Search(fixes, false);
					}
					if (removes(checker, fix.applyTo(text), file, f, errorsBefore)) {
						verified.add(fix);
						if (FIRST_ONLY) {
							break; // a provider's proposals run from the least change up: the first that works
						}
					}
				}
			}
			if (!verified.isEmpty()) {
				fixes.put(f, verified);
			}
		}
		return new Search(fixes, true);
	}

	private static boolean removes(DesignChecker checker, String fixed, String file, Finding target, Set<String> before) {
		DesignResult after = checker.check(fixed, file, CancelIndicator.NullImpl);
		boolean gone = after.findings().stream()
				.noneMatch(g -> g.rule().equals(target.rule()) && java.util.Objects.equals(g.part(), target.part()));
		boolean noNewError = before.containsAll(keys(after, Severity.ERROR));
		return gone && noNewError && after.status() != bulwark.check.Status.ERROR;
	}

	private static Set<String> keys(DesignResult r, Severity severity) {
		Set<String> keys = new HashSet<>();
		for (Finding f : r.findings()) {
			if (f.severity() == severity && !f.waived()) {
				keys.add(f.rule() + "|" + f.part());
			}
		}
		return keys;
	}
}
