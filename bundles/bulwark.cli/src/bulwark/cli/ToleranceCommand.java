package bulwark.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import bulwark.check.DesignChecker;
import bulwark.check.Preparation;
import bulwark.check.PreparedDesign;
import bulwark.check.policy.PolicyFiles;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.tolerance.Progress;
import bulwark.check.tolerance.ToleranceAnalysis;
import bulwark.check.report.ToleranceReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import bulwark.check.policy.Distribution;

@Command(name = "tolerance", description = {
		"Tolerance analysis: every toleranced part at its limits (corners), then Monte Carlo samples, for the "
				+ "function figures and each part's worst utilisation; the yield against each requirement.",
		"Exit code 1 when a requirement's yield, or the share of samples keeping every part within its derated "
				+ "ratings, is below 100 %; 2 when the design cannot be analysed." })
final class ToleranceCommand implements Callable<Integer> {
	@picocli.CommandLine.Mixin
	HelpOption help;

	enum Format {
		text, json, html
	}

	@Parameters(paramLabel = "FILE", description = "The design file.")
	Path file;

	@Option(names = "--samples", defaultValue = "1000", paramLabel = "N", description = "Monte Carlo samples (default: ${DEFAULT-VALUE}; 0 for corners only).")
	int samples;

	@Option(names = "--seed", defaultValue = "1", paramLabel = "S", description = "Seed of the samples; the same seed gives the same run (default: ${DEFAULT-VALUE}).")
	long seed;

	@Option(names = "--format", defaultValue = "text", description = "Report format: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
	Format format;

	@Option(names = "--policy", paramLabel = "FILE", description = "The review policy (default: the one the design names, else the built-in one).")
	Path policy;

	@Spec
	CommandSpec spec;

	@Override
	public Integer call() throws IOException {
		PrintWriter out = spec.commandLine().getOut();
		PrintWriter err = spec.commandLine().getErr();
		if (samples < 0) {
			err.println("bulwark: --samples takes 0 or more");
			return ExitCodes.USAGE;
		}
		DesignChecker checker = Language.checker();
		if (policy != null) {
			PolicyFiles.Resolution r = checker.policies().read(policy);
			if (r.policy().isEmpty()) {
				r.problems().forEach(f -> err.println("bulwark: " + f.message()));
				return ExitCodes.NOT_CHECKED;
			}
			checker = Language.checker(r.policy().get());
		}
		Preparation prepared = checker.prepare(file);
		if (prepared instanceof Preparation.Stopped stopped) {
			Stopping.explain(stopped, err);
			return ExitCodes.NOT_CHECKED;
		}
		PreparedDesign design = ((Preparation.Ready) prepared).design();
		ReviewPolicy chosen = design.policy();
		Distribution distribution = chosen.distribution();
		ToleranceAnalysis.Result result = ToleranceAnalysis.run(design.loaded().design(), chosen, samples, seed, distribution,
				progress(err));
		switch (format) {
		case json -> ToleranceReport.json(result, file.toString(), bulwark.check.report.Caution.TEXT, out);
		case html -> ToleranceReport.html(result, file.toString(), bulwark.check.report.Caution.TEXT, out);
		default -> ToleranceReport.text(result, file.toString(), bulwark.check.report.Caution.TEXT, out);
		}
		out.flush();
		if (!result.corners().failures().isEmpty() && result.corners().ranges().isEmpty()) {
			return ExitCodes.NOT_CHECKED;
		}
		return result.yields().stream().anyMatch(y -> y.of() > 0 && y.met() < y.of()) ? ExitCodes.FINDINGS
				: ExitCodes.CLEAN;
	}

	/** A progress line on standard error when it is a terminal: "tolerance: 120 of 1021". */
	private static Progress progress(PrintWriter err) {
		boolean terminal = System.console() != null;
		return new Progress() {
			private int shown = -1;

			@Override
			public synchronized void done(int finished, int total) {
				int percent = (int) (100L * finished / Math.max(1, total));
				if (terminal && percent != shown) {
					shown = percent;
					err.print("\rbulwark: tolerance " + finished + " of " + total + " (" + percent + " %)"
							+ (finished == total ? "\n" : ""));
					err.flush();
				}
			}

			@Override
			public boolean cancelled() {
				return Thread.currentThread().isInterrupted();
			}
		};
	}
}
