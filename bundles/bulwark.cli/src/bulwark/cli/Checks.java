package bulwark.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;


import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.finding.Severity;
import bulwark.check.Status;
import bulwark.check.io.AtomicFile;
import bulwark.check.policy.PolicyFiles;

/** Checks a list of design files and writes the report; shared by the check and demo commands. */
final class Checks {
	private Checks() {
	}

	static int run(List<Path> paths, CheckOptions options, PrintWriter out, PrintWriter err) throws IOException {
		DesignSelection selection = DesignSelection.of(paths, options.shard);
		if (selection.refusal() != null) {
			err.println("bulwark: " + selection.refusal());
			return selection.exitCode();
		}
		List<Path> files = selection.files();
		if (!(options.budget > 0)) {
			err.println("bulwark: --budget takes a number of seconds above 0");
			return ExitCodes.USAGE;
		}
		java.time.Duration budget = java.time.Duration.ofMillis(Math.round(options.budget * 1000));
		DesignChecker checker = Language.checker(null, budget, options.library);
		if (options.policy != null) {
			PolicyFiles.Resolution policy = checker.policies().read(options.policy);
			if (policy.policy().isEmpty()) {
				policy.problems().forEach(f -> err.println("bulwark: " + f.message()));
				err.flush();
				return ExitCodes.NOT_CHECKED;
			}
			checker = Language.checker(policy.policy().get(), budget, options.library);
		}
		if (options.singleFaults) {
			checker = checker.withSingleFaults();
		}
		List<DesignResult> results = checkAll(checker, files, options.jobs, progress(files.size(), err));
		// the report is written as it is made, never held whole: a batch's JSON can be far larger than a design
		DesignChecker reporting = checker; // the lambda below needs a variable set once
		if (options.out == null) {
			CheckReport.write(results, options, reporting, out, err);
			out.flush();
		} else {
			writeAtomically(options.out, w -> CheckReport.write(results, options, reporting, w, err));
		}
		err.println("bulwark: " + summary(results));
		err.println("bulwark: " + bulwark.check.report.Caution.TEXT);
		err.flush();
		return exitCode(results, options.failOn);
	}

	/**
	 * "3 design(s) checked: 1 pass, 1 pass with unchecked parts, 1 fail, 0 not checked"; the unchecked count
	 * only when there is one, so that a plain pass is never read into it.
	 */
	static String summary(List<DesignResult> results) {
		StringBuilder s = new StringBuilder(results.size() + " design(s) checked: ");
		java.util.StringJoiner counts = new java.util.StringJoiner(", ");
		for (Status status : Status.values()) {
			long n = results.stream().filter(r -> r.status() == status).count();
			if (n > 0 || status != Status.PASS_UNCHECKED) {
				counts.add(n + " " + status.label());
			}
		}
		return s.append(counts).toString();
	}

	/** Not checked beats findings beats clean; which findings count is the '--fail-on' option's. */
	static int exitCode(List<DesignResult> results, CheckOptions.FailOn failOn) {
		if (results.stream().anyMatch(r -> r.status() == Status.ERROR)) {
			return ExitCodes.NOT_CHECKED;
		}
		boolean failing = switch (failOn) {
		case never -> false;
		case warning -> results.stream().flatMap(r -> r.findings().stream())
				.anyMatch(f -> !f.waived() && f.severity() != Severity.INFO);
		case error -> results.stream().anyMatch(r -> r.status() == Status.FAIL);
		};
		return failing ? ExitCodes.FINDINGS : ExitCodes.CLEAN;
	}

	/**
	 * A progress line on standard error for long runs at a terminal ("checked 12 of 300"); nothing when the
	 * output goes to a file or a pipe, or for a handful of designs.
	 */
	static Runnable progress(int total, PrintWriter err) {
		if (System.console() == null || total < 10) {
			return () -> {
			};
		}
		java.util.concurrent.atomic.AtomicInteger done = new java.util.concurrent.atomic.AtomicInteger();
		return () -> {
			int n = done.incrementAndGet();
			synchronized (err) {
				err.print("\rbulwark: checked " + n + " of " + total + (n == total ? "\n" : ""));
				err.flush();
			}
		};
	}

	/** Checks the files on a pool of threads (each load has its own resource set); results in file order. */
	static List<DesignResult> checkAll(DesignChecker base, List<Path> files, int jobs, Runnable progress)
			throws IOException {
		java.util.function.Function<Path, DesignResult> checker = f -> {
			DesignResult r = base.check(f);
			progress.run();
			return r;
		};
		int threads = Math.max(1, Math.min(files.size(),
				jobs > 0 ? jobs : Runtime.getRuntime().availableProcessors()));
		if (threads == 1) {
			List<DesignResult> results = new ArrayList<>();
			for (Path f : files) {
				results.add(checker.apply(f));
			}
			return results;
		}
		ExecutorService pool = Executors.newFixedThreadPool(threads);
		try {
			List<Future<DesignResult>> futures = new ArrayList<>();
			for (Path f : files) {
				futures.add(pool.submit(() -> checker.apply(f)));
			}
			List<DesignResult> results = new ArrayList<>();
			for (Future<DesignResult> future : futures) {
				results.add(future.get());
			}
			return results;
		} catch (InterruptedException e) {
			Thread.currentThread().interrupt();
			throw new IOException("interrupted", e);
		} catch (ExecutionException e) {
			throw new IOException("a check stopped: " + e.getCause(), e.getCause());
		} finally {
			pool.shutdownNow();
		}
	}

	/** Writes beside the target, then moves into place, so a reader never sees half a report. */
	static void writeAtomically(Path target, String content) throws IOException {
		AtomicFile.write(target, content, false);
	}

	/** A report written as it is made. */
	@FunctionalInterface
	interface Report {
		void writeTo(Writer w) throws IOException;
	}

	/** As above, the report written (in UTF-8) as it is made rather than held whole first. */
	static void writeAtomically(Path target, Report report) throws IOException {
		AtomicFile.write(target, stream -> {
			Writer w = new java.io.BufferedWriter(new java.io.OutputStreamWriter(stream, StandardCharsets.UTF_8));
			report.writeTo(w);
			w.flush(); // not closed: the atomic write closes its own stream
		}, false);
	}
}
