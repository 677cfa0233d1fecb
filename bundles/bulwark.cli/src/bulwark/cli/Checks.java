package bulwark.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import javax.xml.stream.XMLStreamException;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.finding.Severity;
import bulwark.check.Status;
import bulwark.check.io.AtomicFile;
import bulwark.fix.QuickFixes;
import bulwark.check.policy.PolicyFiles;
import bulwark.check.report.HtmlReport;
import bulwark.check.report.JUnitReport;
import bulwark.check.report.JsonReport;
import bulwark.check.report.SarifReport;
import bulwark.check.report.TextReport;
import bulwark.check.rules.RulePages;

/** Checks a list of design files and writes the report; shared by the check and demo commands. */
final class Checks {
	private Checks() {
	}

	static int run(List<Path> paths, CheckOptions options, PrintWriter out, PrintWriter err) throws IOException {
		List<Path> files = DesignFiles.collect(paths);
		if (options.shard != null) {
			java.util.regex.Matcher m = java.util.regex.Pattern.compile("(\\d+)/(\\d+)").matcher(options.shard);
			int k = m.matches() ? Integer.parseInt(m.group(1)) : 0, n = m.matches() ? Integer.parseInt(m.group(2)) : 0;
			if (n < 1 || k < 1 || k > n) {
				err.println("bulwark: --shard takes K/N with 1 ≤ K ≤ N, for example 2/4; not '" + options.shard + "'");
				return ExitCodes.USAGE;
			}
			files = shard(files, k, n);
			if (files.isEmpty()) {
				err.println("bulwark: shard " + options.shard + " holds no design");
				return ExitCodes.CLEAN;
			}
		}
		if (files.isEmpty()) {
			err.println("bulwark: no design files (*" + DesignFiles.EXTENSION + ") found in " + paths);
			return ExitCodes.USAGE;
		}
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
		List<DesignResult> results = checkAll(checker, files, options.jobs, progress(files.size(), err));
		StringWriter report = new StringWriter();
		write(results, options, checker, report);
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
		if (error > 0) {
			return ExitCodes.NOT_CHECKED;
		}
		boolean failing;
		switch (options.failOn) {
		case never:
			failing = false;
			break;
		case warning:
			failing = results.stream().flatMap(r -> r.findings().stream())
					.anyMatch(f -> !f.waived() && f.severity() != Severity.INFO);
			break;
		case error:
		default:
			failing = fail > 0;
		}
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

	/**
	 * The K-th of N shares of the files, by position in path order, so that every runner that lists the same
	 * folders gets the same share and the shares cover every file once.
	 */
	static List<Path> shard(List<Path> files, int k, int n) {
		List<Path> sorted = new ArrayList<>(files);
		sorted.sort(null);
		List<Path> mine = new ArrayList<>();
		for (int i = 0; i < sorted.size(); i++) {
			if (i % n == k - 1) {
				mine.add(sorted.get(i));
			}
		}
		return mine;
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

	private static void write(List<DesignResult> results, CheckOptions options, DesignChecker checker, Writer w)
			throws IOException {
		switch (options.format) {
		case json:
			JsonReport.write(results, Version.get(), Safety.CAUTION,
					options.noFixes ? (r, f) -> List.of() : fixes(checker), w);
			break;
		case html:
			HtmlReport.write(results, Version.get(), Safety.CAUTION, w);
			break;
		case sarif:
			SarifReport.write(results, Version.get(), Safety.CAUTION,
					rule -> RulePages.page(checker.loader().installation(), rule).orElse(null), w);
			break;
		case junit:
			try {
				JUnitReport.write(results, w);
			} catch (XMLStreamException e) {
				throw new IOException(e);
			}
			break;
		case text:
		default:
			TextReport.write(results, w);
		}
	}

	/** The verified quick fixes of each finding, worked out once per design when the report asks. */
	private static java.util.function.BiFunction<DesignResult, bulwark.check.finding.Finding, List<bulwark.check.fix.Fix>> fixes(
			DesignChecker checker) {
		java.util.Map<DesignResult, java.util.Map<bulwark.check.finding.Finding, List<bulwark.check.fix.Fix>>> cache =
				new java.util.IdentityHashMap<>();
		return (r, f) -> cache.computeIfAbsent(r, d -> {
			try {
				String text = Files.readString(Path.of(d.file()), StandardCharsets.UTF_8);
				return QuickFixes.of(checker, text, d.file(), d);
			} catch (IOException | RuntimeException e) {
				return java.util.Map.of(); // an unreadable file has no fixes; its findings say why
			}
		}).getOrDefault(f, List.of());
	}

	/** Writes beside the target, then moves into place, so a reader never sees half a report. */
	static void writeAtomically(Path target, String content) throws IOException {
		AtomicFile.write(target, content, false);
	}
}
