package bulwark.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

import bulwark.check.DesignChecker;
import bulwark.check.compare.Revisions;
import bulwark.check.DesignResult;
import bulwark.check.Status;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "compare", description = {
		"Compares two revisions of a design, for review: findings new and fixed, and each rated part's worst "
				+ "utilisation, worse or better.",
		"Exit 1 when the new revision adds an error." })
final class CompareCommand implements Callable<Integer> {
	@picocli.CommandLine.Mixin
	HelpOption help;


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
		boolean newError = false;
		java.util.List<Revisions.Change> changes = Revisions.compare(before, after);
		for (Revisions.Change c : changes) {
			out.printf(Locale.ROOT, "%-8s %s%n", c.kind(), c.text());
			newError |= c.newError();
		}
		if (changes.isEmpty()) {
			// said, not left blank: an empty output reads as a command that did nothing
			out.println("no differences: the same findings, and every rated part's worst utilisation within "
					+ String.format(Locale.ROOT, "%.1f", 100 * Revisions.NOTICEABLE) + " percentage points of what it was");
		}
		out.flush();
		spec.commandLine().getErr().println("bulwark: " + bulwark.check.report.Caution.TEXT);
		spec.commandLine().getErr().flush();
		return newError ? ExitCodes.FINDINGS : ExitCodes.CLEAN;
	}
}
