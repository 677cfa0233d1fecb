package bulwark.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.TreeSet;

import bulwark.check.finding.Concern;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.report.HtmlReport;

/** The class summary of a classroom batch: a CSV for the gradebook and an HTML page linking each feedback page. */
final class ClassSummary {
	private ClassSummary() {
	}

	static String csv(Path dir, List<Path> files, List<DesignResult> results) {
		List<String> header = new java.util.ArrayList<>(List.of("design", "title", "status", "errors", "warnings"));
		for (Concern c : Concern.values()) {
			header.add("errors " + c.id());
		}
		header.add("requirements missed");
		StringBuilder s = new StringBuilder(String.join(",", header.stream().map(ClassSummary::field).toList())).append('\n');
		for (int i = 0; i < files.size(); i++) {
			DesignResult r = results.get(i);
			List<Object> row = new java.util.ArrayList<>(List.of(dir.relativize(files.get(i)).toString(),
					r.title() == null ? "" : r.title(), r.status().id(), count(r, Severity.ERROR, null),
					count(r, Severity.WARNING, null)));
			for (Concern c : Concern.values()) {
				row.add(count(r, Severity.ERROR, c));
			}
			row.add(ClassroomCommand.missedRequirements(r));
			s.append(String.join(",", row.stream().map(v -> field(String.valueOf(v))).toList())).append('\n');
		}
		// the caution as the last row, in the first column, where a spreadsheet shows it
		s.append(field(bulwark.check.report.Caution.TEXT)).append('\n');
		return s.toString();
	}

	static String html(Path dir, List<Path> files, List<DesignResult> results, List<String> pages, String policy) {
		StringBuilder s = new StringBuilder("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">"
				+ "<title>Bulwark class summary</title><style>body{font-family:sans-serif;margin:2em}"
				+ "table{border-collapse:collapse}td,th{border:1px solid #bbb;padding:.2em .5em}"
				+ ".caution{border:2px solid #b23a48;padding:.6em}.pass{color:#4a7c59}.pass-unchecked{color:#8a6d1f}.fail,.error{color:#b23a48}"
				+ "</style></head><body>\n<h1>Class summary</h1>\n");
		s.append("<p class=\"caution\"><strong>").append(HtmlReport.escape(bulwark.check.report.Caution.TEXT)).append("</strong></p>\n");
		s.append("<p>").append(files.size()).append(" design(s) under the review policy '")
				.append(HtmlReport.escape(policy)).append("'</p>\n");
		s.append("<table><tr><th>design</th><th>status</th><th>errors</th><th>warnings</th><th>requirements missed</th>"
				+ "<th>errors by concern</th></tr>\n");
		for (int i = 0; i < files.size(); i++) {
			DesignResult r = results.get(i);
			TreeSet<String> concerns = new TreeSet<>();
			r.findings().stream().filter(f -> f.severity() == Severity.ERROR && !f.waived())
					.forEach(f -> concerns.add(f.concern().id()));
			s.append("<tr><td><a href=\"").append(HtmlReport.escape(pages.get(i))).append("\">")
					.append(HtmlReport.escape(dir.relativize(files.get(i)).toString())).append("</a></td><td class=\"")
					.append(r.status().id()).append("\">").append(r.status().label()).append("</td><td>")
					.append(count(r, Severity.ERROR, null)).append("</td><td>").append(count(r, Severity.WARNING, null))
					.append("</td><td>").append(ClassroomCommand.missedRequirements(r)).append("</td><td>")
					.append(HtmlReport.escape(String.join(", ", concerns))).append("</td></tr>\n");
		}
		return s.append("</table>\n</body></html>\n").toString();
	}

	private static long count(DesignResult r, Severity severity, Concern concern) {
		if (concern == null) {
			return r.count(severity);
		}
		return r.findings().stream().filter(
				(Finding f) -> f.severity() == severity && !f.waived() && f.concern() == concern)
				.count();
	}

	/**
	 * A CSV field (RFC 4180), always quoted, so that no comma, quote or line break of any kind in a title or
	 * file name can split it. A field starting with = + - @, a tab or a carriage return gets a leading
	 * apostrophe, whatever follows, so that a spreadsheet never reads it as a formula [common practice: the
	 * spreadsheet formula-injection guidance of the web security community].
	 */
	static String field(String value) {
		String v = value == null ? "" : value;
		if (!v.isEmpty() && "=+-@\t\r".indexOf(v.charAt(0)) >= 0) {
			v = "'" + v;
		}
		return "\"" + v.replace("\"", "\"\"") + "\"";
	}
}
