package bulwark.cli;

import java.nio.file.Path;

import picocli.CommandLine.Option;

/** Options shared by the commands that check designs. */
public final class CheckOptions {
	public enum Format {
		text, json, sarif, junit, html
	}

	public enum FailOn {
		error, warning, never
	}

	@Option(names = "--fail-on", defaultValue = "error",
			description = "Exit with 1 when a finding of this severity or worse is not waived: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
	FailOn failOn;

	@Option(names = "--shard", paramLabel = "K/N",
			description = "Check only the K-th of N equal shares of the designs (1 ≤ K ≤ N), the same share on every runner.")
	String shard;

	@Option(names = "--jobs", defaultValue = "0", paramLabel = "N",
			description = "Designs checked at once (default: one per processor).")
	int jobs;

	@Option(names = "--format", defaultValue = "text",
			description = "Report format: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
	Format format;

	@Option(names = "--policy", paramLabel = "FILE",
			description = "Check under this review policy (a *.bulwark-policy file), whatever policy the designs name.")
	Path policy;

	@Option(names = "--library", paramLabel = "FOLDER",
			description = "A folder where 'use \"…\"' also looks for parts libraries (repeatable; the BULWARK_LIBRARY environment variable adds more).")
	java.util.List<Path> library = new java.util.ArrayList<>();

	@Option(names = "--budget", defaultValue = "60", paramLabel = "SECONDS",
			description = "Time one design's check may take; past it the design is reported as not checked and the batch goes on (default: ${DEFAULT-VALUE}).")
	double budget;

	@Option(names = "--single-faults", description = "Also fail each part in turn (shorted, open) and solve every case"
			+ " again: a warning for each fault that puts another part over its absolute rating (rule single-fault;"
			+ " each fault costs about one whole check).")
	boolean singleFaults;

	@Option(names = "--no-fixes", description = "Leave out the quick fixes the JSON report otherwise gives each finding (each is checked by a full re-check, which costs time on large batches).")
	boolean noFixes;

	@Option(names = "--out", paramLabel = "FILE", description = "Write the report to FILE (atomically) instead of standard output.")
	Path out;
}
