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
		StringBuilder s = new StringBuilder("design,title,status,errors,warnings");
		for (Concern c : Concern.values()) {
			s.append(",errors ").append(c.id());
		}
		s.append(",requirements missed\n");
		for (int i = 0; i < files.size(); i++) {
			DesignResult r = results.get(i);
			s.append(field(dir.relativize(files.get(i)).toString())).append(',').append(field(r.title())).append(',')
					.append(r.status().id()).append(',').append(count(r, Severity.ERROR, null)).append(',')
					.append(count(r, Severity.WARNING, null));
			for (Concern c : Concern.values()) {
				s.append(',').append(count(r, Severity.ERROR, c));
			}
			s.append(',').append(ClassroomCommand.missedRequirements(r)).append('\n');
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
		return r.findings().stream().filter(
				(Finding f) -> f.severity() == severity && !f.waived() && (concern == null || f.concern() == concern))
				.count();
	}

	/** A CSV field (RFC 4180): quoted when it holds a comma, quote or line break; a leading = + - @ defused. */
	static String field(String value) {
		if (value == null) {
			return "";
		}
		String v = value.matches("^[=+\\-@].*") ? "'" + value : value;
		return v.matches(".*[,\"\\r\\n].*") ? "\"" + v.replace("\"", "\"\"") + "\"" : v;
	}
}
