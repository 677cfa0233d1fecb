package bulwark.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;

import bulwark.check.CaseResult;
import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.Finding;
import bulwark.check.PartStress;
import bulwark.check.Status;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "compare", description = { "Compares two revisions of a design, for review: findings new and fixed,",
		"and each rated part's worst utilisation, worse or better. Exit 1 when the new revision adds an error." })
final class CompareCommand implements Callable<Integer> {
	/** Utilisation changes smaller than this are not reported (rounding, not design). */
	static final double NOTICEABLE = 0.005;

	@Parameters(index = "0", paramLabel = "OLD", description = "The earlier revision.")
	Path older;

	@Parameters(index = "1", paramLabel = "NEW", description = "The later revision.")
	Path newer;

	@Spec
	CommandSpec spec;

	@Override
	public Integer call() {
		PrintWriter out = spec.commandLine().getOut();
		DesignChecker checker = Language.checker();
		DesignResult before = checker.check(older);
		DesignResult after = checker.check(newer);
		if (before.status() == Status.ERROR || after.status() == Status.ERROR) {
			spec.commandLine().getErr().println("bulwark: " + (before.status() == Status.ERROR ? older : newer)
					+ " could not be checked; run 'bulwark check' on it to see why");
			return ExitCodes.NOT_CHECKED;
		}
		Set<String> was = keys(before), is = keys(after);
		boolean newError = false;
		for (Finding f : after.findings()) {
			if (!was.contains(key(f))) {
				out.println("new      " + f.severity().id() + " " + f.rule() + " " + f.message());
				newError |= f.severity() == bulwark.check.Severity.ERROR && !f.waived();
			}
		}
		for (Finding f : before.findings()) {
			if (!is.contains(key(f))) {
				out.println("fixed    " + f.severity().id() + " " + f.rule() + " " + f.message());
			}
		}
		Map<String, Double> u0 = worst(before), u1 = worst(after);
		for (Map.Entry<String, Double> e : u1.entrySet()) {
			Double old = u0.get(e.getKey());
			if (old != null && Math.abs(e.getValue() - old) >= NOTICEABLE) {
				out.printf(Locale.ROOT, "%-8s %s worst utilisation %.0f %% → %.0f %%%n", e.getValue() > old ? "worse" : "better",
						e.getKey(), 100 * old, 100 * e.getValue());
			}
		}
		out.flush();
		return newError ? ExitCodes.FINDINGS : ExitCodes.CLEAN;
	}

	/** A finding's identity across revisions: its rule and its part (lines move, messages carry figures). */
	private static String key(Finding f) {
		return f.rule() + "\u0000" + (f.part() == null ? f.message() : f.part());
	}

	private static Set<String> keys(DesignResult r) {
		Set<String> keys = new LinkedHashSet<>();
		r.findings().forEach(f -> keys.add(key(f)));
		return keys;
	}

	private static Map<String, Double> worst(DesignResult r) {
		Map<String, Double> worst = new LinkedHashMap<>();
		for (CaseResult c : r.cases()) {
			for (PartStress p : c.parts()) {
				if (p.utilisation() != null) {
					worst.merge(p.part(), p.utilisation(), Math::max);
				}
			}
		}
		return worst;
	}
}
