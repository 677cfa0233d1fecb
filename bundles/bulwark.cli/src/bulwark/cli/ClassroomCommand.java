package bulwark.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;

import bulwark.check.finding.Concern;
import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.policy.PolicyFiles;
import bulwark.check.report.HtmlReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "classroom", description = {
		"Checks every design in a class's folder under one policy and writes one feedback page per design and a "
				+ "class summary (summary.html, summary.csv) into the output folder.",
		"A submission that does not parse gets its located errors on its page; the batch goes on. Nothing is "
				+ "ever written inside the class's folder." })
final class ClassroomCommand implements Callable<Integer> {
	@picocli.CommandLine.Mixin
	HelpOption help;

	@Parameters(paramLabel = "DIR", description = "The folder of the students' designs.")
	Path dir;

	@Option(names = "--policy", required = true, paramLabel = "FILE", description = "The review policy of the exercise.")
	Path policy;

	@Option(names = "--out", required = true, paramLabel = "DIR", description = "Where the pages go (outside DIR).")
	Path out;

	@Option(names = "--jobs", defaultValue = "0", paramLabel = "N", description = "Designs checked at once (default: one per processor).")
	int jobs;

	@Spec
	CommandSpec spec;

	@Override
	public Integer call() throws IOException {
		PrintWriter err = spec.commandLine().getErr();
		if (!Files.isDirectory(dir)) {
			err.println("bulwark: " + dir + " is not a folder");
			return ExitCodes.USAGE;
		}
		Path classFolder = dir.toRealPath();
		Path target = out.toAbsolutePath().normalize();
		Path existing = target;
		while (existing != null && !Files.exists(existing)) {
			existing = existing.getParent();
		}
		if (existing != null && (existing.toRealPath().startsWith(classFolder) || target.startsWith(classFolder))) {
			err.println("bulwark: --out must be outside the class's folder " + classFolder + "; nothing is written there");
			return ExitCodes.USAGE;
		}
		DesignChecker base = Language.checker();
		PolicyFiles.Resolution r = base.policies().read(policy);
		if (r.policy().isEmpty()) {
			r.problems().forEach(f -> err.println("bulwark: " + f.message()));
			return ExitCodes.NOT_CHECKED;
		}
		List<Path> files = DesignFiles.collect(List.of(dir));
		if (files.isEmpty()) {
			err.println("bulwark: no design files in " + dir);
			return ExitCodes.USAGE;
		}
		List<DesignResult> results = Checks.checkAll(Language.checker(r.policy().get()), files, jobs,
				Checks.progress(files.size(), err));
		Files.createDirectories(target);
		List<String> pages = pageNames(files.stream().map(dir::relativize).toList());
		for (int i = 0; i < files.size(); i++) {
			String page = pages.get(i);
			// the student's page names the design from the class's folder, never by where the teacher keeps it
			DesignResult checked = results.get(i);
			DesignResult result = new DesignResult(dir.relativize(files.get(i)).toString(), checked.title(), checked.status(),
					checked.findings(), checked.cases(), checked.policy(), checked.stresses(), checked.function(),
					checked.waveforms());
			String title = (checked.title() == null ? result.file() : checked.title()) + " — feedback";
			Checks.writeAtomically(target.resolve(page),
					w -> HtmlReport.write(List.of(result), Version.get(), bulwark.check.report.Caution.TEXT, title, w));
		}
		Checks.writeAtomically(target.resolve("summary.csv"), ClassSummary.csv(dir, files, results));
		Checks.writeAtomically(target.resolve("summary.html"),
				ClassSummary.html(dir, files, results, pages, r.policy().get().title()));
		err.printf("bulwark: %d design(s); feedback in %s%n", files.size(), target.resolve("summary.html"));
		err.flush();
		return ExitCodes.CLEAN;
	}

	/** "group-a/kim.bulwark" → "group-a__kim": one flat folder of pages, one per design. */
	static String pageName(Path relative) {
		String name = relative.toString().replace('\\', '/').replaceAll("\\.bulwark$", "");
		return name.replace("/", "__").replaceAll("[^A-Za-z0-9._-]", "_");
	}

	/**
	 * A page name per design, in order, no two alike — not even in letter case, for file systems that ignore
	 * it — and none the summary's: "a b" and "a_b" become a_b.html and a_b-2.html, a design called
	 * "summary" gets summary-2.html.
	 */
	static List<String> pageNames(List<Path> relatives) {
		java.util.Set<String> taken = new java.util.HashSet<>(List.of("summary"));
		List<String> pages = new ArrayList<>();
		for (Path relative : relatives) {
			String base = pageName(relative);
			String name = base;
			for (int n = 2; !taken.add(name.toLowerCase(java.util.Locale.ROOT)); n++) {
				name = base + "-" + n;
			}
			pages.add(name + ".html");
		}
		return pages;
	}

	/** Unwaived findings by concern and severity, for the summary. */
	static Map<String, Integer> counts(DesignResult r) {
		Map<String, Integer> counts = new TreeMap<>();
		for (Finding f : r.findings()) {
			if (!f.waived()) {
				counts.merge(f.severity().id() + " " + f.concern().id(), 1, Integer::sum);
			}
		}
		return counts;
	}

	static long missedRequirements(DesignResult r) {
		return r.findings().stream()
				.filter(f -> f.concern() == Concern.REQUIREMENT && f.severity() == Severity.ERROR && !f.waived()).count();
	}
}
