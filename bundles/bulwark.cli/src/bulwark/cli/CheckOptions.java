package bulwark.cli;

import java.nio.file.Path;

import picocli.CommandLine.Option;

/** Options shared by the commands that check designs. */
public final class CheckOptions {
	public enum Format {
		text, json
	}

	@Option(names = "--format", defaultValue = "text",
			description = "Report format: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
	Format format;

	@Option(names = "--out", paramLabel = "FILE", description = "Write the report to FILE (atomically) instead of standard output.")
	Path out;
}
