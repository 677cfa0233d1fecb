package bulwark.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.Status;
import bulwark.check.report.JsonReport;
import bulwark.check.report.TextReport;

/** Checks a list of design files and writes the report; shared by the check and demo commands. */
final class Checks {
	private Checks() {
	}

	static int run(List<Path> paths, CheckOptions options, PrintWriter out, PrintWriter err) throws IOException {
		List<Path> files = DesignFiles.collect(paths);
		if (files.isEmpty()) {
			err.println("bulwark: no design files (*" + DesignFiles.EXTENSION + ") found in " + paths);
			return ExitCodes.USAGE;
		}
		DesignChecker checker = Language.checker();
		List<DesignResult> results = new ArrayList<>();
		for (Path f : files) {
			results.add(checker.check(f));
		}
		StringWriter report = new StringWriter();
		write(results, options, report);
		if (options.out == null) {
			out.print(report);
			out.flush();
		} else {
			writeAtomically(options.out, report.toString());
		}
		long pass = results.stream().filter(r -> r.status() == Status.PASS).count();
		long fail = results.stream().filter(r -> r.status() == Status.FAIL).count();
		long error = results.stream().filter(r -> r.status() == Status.ERROR).count();
		err.printf("bulwark: %d design(s) checked: %d pass, %d fail, %d not checked%n", results.size(), pass, fail,
				error);
		err.flush();
		return error > 0 ? ExitCodes.NOT_CHECKED : fail > 0 ? ExitCodes.FINDINGS : ExitCodes.CLEAN;
	}

	private static void write(List<DesignResult> results, CheckOptions options, Writer w) throws IOException {
		switch (options.format) {
		case json:
			JsonReport.write(results, Version.get(), Safety.CAUTION, w);
			break;
		case text:
		default:
			TextReport.write(results, w);
		}
	}

	/** Writes beside the target, then moves into place, so a reader never sees half a report. */
	private static void writeAtomically(Path target, String content) throws IOException {
		Path abs = target.toAbsolutePath();
		Path dir = abs.getParent();
		Files.createDirectories(dir);
		Path tmp = Files.createTempFile(dir, "." + abs.getFileName(), ".tmp");
		try {
			Files.writeString(tmp, content, StandardCharsets.UTF_8);
			Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
		} finally {
			Files.deleteIfExists(tmp);
		}
	}
}
