package bulwark.cli;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.List;

import javax.xml.stream.XMLStreamException;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.load.TextFiles;
import bulwark.check.report.HtmlReport;
import bulwark.check.report.JUnitReport;
import bulwark.check.report.JsonReport;
import bulwark.check.report.SarifReport;
import bulwark.check.report.TextReport;
import bulwark.check.rules.RulePages;
import bulwark.fix.QuickFixes;

/** The report of a check run in the format the options ask for, with the verified fixes where it has room. */
final class CheckReport {
	private CheckReport() {
	}

	/** @param err where a note goes when a design's fix search stopped at its time limit */
	static void write(List<DesignResult> results, CheckOptions options, DesignChecker checker, Writer w,
			java.io.PrintWriter err) throws IOException {
		switch (options.format) {
		case json:
			JsonReport.write(results, Version.get(), bulwark.check.report.Caution.TEXT,
					options.noFixes ? (r, f) -> List.of() : fixes(checker, err), w);
			break;
		case html:
			HtmlReport.write(results, Version.get(), bulwark.check.report.Caution.TEXT, w);
			break;
		case sarif:
			SarifReport.write(results, Version.get(), bulwark.check.report.Caution.TEXT,
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

	/**
	 * The verified quick fixes of each finding, worked out once per design when the report asks, for as long
	 * as one design's check may take: past that, the later findings are offered none, and a note says so.
	 */
	private static java.util.function.BiFunction<DesignResult, bulwark.check.finding.Finding, List<bulwark.check.fix.Fix>> fixes(
			DesignChecker checker, java.io.PrintWriter err) {
		java.util.Map<DesignResult, java.util.Map<bulwark.check.finding.Finding, List<bulwark.check.fix.Fix>>> cache =
				new java.util.IdentityHashMap<>();
		return (r, f) -> cache.computeIfAbsent(r, d -> {
			if (d.status() == bulwark.check.Status.ERROR) {
				return java.util.Map.of(); // not checked (refused, unreadable, too large): never read again for fixes
			}
			try {
				TextFiles.Read read = TextFiles.read(Path.of(d.file()), "the design");
				if (!(read instanceof TextFiles.Text t)) {
					return java.util.Map.of();
				}
				QuickFixes.Search search = QuickFixes.search(checker, t.text(), d.file(), d, checker.budget());
				if (!search.complete()) {
					err.printf(java.util.Locale.ROOT, "bulwark: %s: quick fixes were looked for during %.3g s only (each "
							+ "proposal is a whole check of the changed design); the later findings have none offered%n",
							d.file(), checker.budget().toMillis() / 1000.0);
					err.flush();
				}
				return search.fixes();
			} catch (RuntimeException | OutOfMemoryError e) {
				return java.util.Map.of(); // no fixes offered; the findings stand as checked
			}
		}).getOrDefault(f, List.of());
	}
}
