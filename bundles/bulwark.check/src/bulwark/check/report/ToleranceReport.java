package bulwark.check.report;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import com.google.gson.stream.JsonWriter;

import bulwark.check.figures.Figures;
import bulwark.check.tolerance.Corners;
import bulwark.check.tolerance.Figure;
import bulwark.check.tolerance.Statistics;
import bulwark.check.tolerance.ToleranceAnalysis;
import bulwark.check.tolerance.Toleranced;
import bulwark.check.tolerance.Yield;

/** The tolerance analysis as text, JSON (SI values; names a contract like the check's) or one HTML page. */
public final class ToleranceReport {
	private ToleranceReport() {
	}

	public static void text(ToleranceAnalysis.Result r, String file, String caution, Writer w) throws IOException {
		w.write("Tolerance analysis of " + file + "\n");
		w.write(r.toleranced().size() + " toleranced parameter(s): " + String.join(", ",
				r.toleranced().stream().map(t -> t.key() + " ±" + percent(t.fraction())).toList()) + "\n\n");
		w.write("Corners (each part at its tolerance limits, worst direction per figure)\n");
		for (Corners.Range c : r.corners().ranges()) {
			w.write(String.format(Locale.ROOT, "  %-34s nominal %-12s low %-12s high %s%n", c.figure().name(),
					show(c.figure(), c.nominal()), show(c.figure(), c.low()), show(c.figure(), c.high())));
		}
		if (r.samples() > 0) {
			w.write(String.format(Locale.ROOT, "%nMonte Carlo (%d samples, seed %d, %s)%n", r.monteCarlo().samples().size(),
					r.seed(), r.distribution().word()));
			for (Statistics s : r.statistics()) {
				Figure f = s.figure();
				w.write(String.format(Locale.ROOT, "  %-34s min %-10s 1 %% %-10s median %-10s mean %-10s 99 %% %-10s max %s%n",
						f.name(), show(f, s.min()), show(f, s.p1()), show(f, s.p50()), show(f, s.mean()), show(f, s.p99()),
						show(f, s.max())));
			}
			w.write("\nYield\n");
			for (Yield y : r.yields()) {
				w.write(String.format(Locale.ROOT, "  %-60s %d of %d (%s)%n", y.requirement(), y.met(), y.of(),
						Double.isNaN(y.fraction()) ? "no samples" : percent(y.fraction())));
			}
		}
		List<String> failures = failures(r);
		if (!failures.isEmpty()) {
			w.write("\nNot solved (" + failures.size() + ")\n");
			for (String f : failures) {
				w.write("  " + f + "\n");
			}
		}
		if (r.monteCarlo().cancelled() || r.corners().cancelled()) {
			w.write("\nThe run was cancelled: the figures above cover only what was finished.\n");
		}
		w.write("\n" + caution + "\n");
		w.flush();
	}

	@SuppressWarnings("resource") // the JSON writer only wraps the caller's writer, which the caller closes
	public static void json(ToleranceAnalysis.Result r, String file, String caution, Writer out) throws IOException {
		JsonWriter w = new JsonWriter(out);
		w.setIndent("  ");
		w.beginObject();
		w.name("file").value(file);
		w.name("caution").value(caution);
		w.name("toleranced").beginArray();
		for (Toleranced t : r.toleranced()) {
			w.beginObject().name("part").value(t.part()).name("parameter").value(t.parameter()).name("tolerance")
					.value(t.fraction()).endObject();
		}
		w.endArray();
		w.name("corners").beginArray();
		for (Corners.Range c : r.corners().ranges()) {
			w.beginObject().name("figure").value(c.figure().name()).name("unit").value(c.figure().unit());
			number(w.name("nominal"), c.nominal());
			number(w.name("low"), c.low());
			number(w.name("high"), c.high());
			w.endObject();
		}
		w.endArray();
		w.name("monte_carlo").beginObject();
		w.name("samples").value(r.monteCarlo().samples().size());
		w.name("seed").value(r.seed());
		w.name("distribution").value(r.distribution().word());
		w.name("figures").beginArray();
		for (Statistics s : r.statistics()) {
			w.beginObject().name("figure").value(s.figure().name()).name("unit").value(s.figure().unit());
			number(w.name("min"), s.min());
			number(w.name("p1"), s.p1());
			number(w.name("median"), s.p50());
			number(w.name("mean"), s.mean());
			number(w.name("p99"), s.p99());
			number(w.name("max"), s.max());
			w.endObject();
		}
		w.endArray();
		w.name("yield").beginArray();
		for (Yield y : r.yields()) {
			w.beginObject().name("requirement").value(y.requirement()).name("met").value(y.met()).name("of").value(y.of());
			number(w.name("fraction"), y.fraction());
			w.endObject();
		}
		w.endArray();
		w.name("cancelled").value(r.monteCarlo().cancelled() || r.corners().cancelled());
		w.endObject();
		w.name("not_solved").beginArray();
		for (String f : failures(r)) {
			w.value(f);
		}
		w.endArray();
		w.endObject();
		w.flush();
		out.write('\n');
		out.flush();
	}

	public static void html(ToleranceAnalysis.Result r, String file, String caution, Writer w) throws IOException {
		w.write("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>Bulwark tolerance analysis</title>\n"
				+ "<style>body{font-family:sans-serif;margin:2em;max-width:70em}table{border-collapse:collapse}"
				+ "td,th{border:1px solid #bbb;padding:.2em .5em;text-align:right}td:first-child,th:first-child{text-align:left}"
				+ ".caution{border:2px solid #b23a48;padding:.6em}</style></head><body>\n");
		w.write("<h1>Tolerance analysis of " + HtmlReport.escape(file) + "</h1>\n");
		w.write("<p class=\"caution\"><strong>" + HtmlReport.escape(caution) + "</strong></p>\n");
		w.write("<h2>Corners</h2>\n<table><tr><th>figure</th><th>nominal</th><th>low</th><th>high</th></tr>\n");
		for (Corners.Range c : r.corners().ranges()) {
			w.write("<tr><td>" + HtmlReport.escape(c.figure().name()) + "</td><td>" + HtmlReport.escape(show(c.figure(), c.nominal()))
					+ "</td><td>" + HtmlReport.escape(show(c.figure(), c.low())) + "</td><td>"
					+ HtmlReport.escape(show(c.figure(), c.high())) + "</td></tr>\n");
		}
		w.write("</table>\n<h2>Monte Carlo</h2>\n<p>" + r.monteCarlo().samples().size() + " samples, seed " + r.seed() + ", "
				+ r.distribution().word() + "</p>\n");
		w.write("<table><tr><th>figure</th><th>min</th><th>1 %</th><th>median</th><th>mean</th><th>99 %</th><th>max</th></tr>\n");
		for (Statistics s : r.statistics()) {
			Figure f = s.figure();
			w.write("<tr><td>" + HtmlReport.escape(f.name()) + "</td>");
			for (double v : new double[] { s.min(), s.p1(), s.p50(), s.mean(), s.p99(), s.max() }) {
				w.write("<td>" + HtmlReport.escape(show(f, v)) + "</td>");
			}
			w.write("</tr>\n");
		}
		w.write("</table>\n<h2>Yield</h2>\n<table><tr><th>requirement</th><th>met</th></tr>\n");
		for (Yield y : r.yields()) {
			w.write("<tr><td>" + HtmlReport.escape(y.requirement()) + "</td><td>" + y.met() + " of " + y.of() + "</td></tr>\n");
		}
		w.write("</table>\n");
		for (String f : failures(r)) {
			w.write("<p>Not solved: " + HtmlReport.escape(f) + "</p>\n");
		}
		w.write("</body></html>\n");
		w.flush();
	}

	private static List<String> failures(ToleranceAnalysis.Result r) {
		List<String> all = new ArrayList<>(r.corners().failures());
		all.addAll(r.monteCarlo().failures());
		return all;
	}

	/** A figure's value as the reports show it: engineering units, hours, or a percentage of the rating. */
	public static String show(Figure f, double v) {
		if (f.unit().isEmpty()) {
			return percent(v); // a utilisation
		}
		if (f.unit().equals("h")) {
			return String.format(Locale.ROOT, "%.0f h", v);
		}
		return Figures.engineering(v, f.unit());
	}

	public static String percent(double fraction) {
		return String.format(Locale.ROOT, "%.1f %%", 100 * fraction);
	}

	private static void number(JsonWriter w, double v) throws IOException {
		if (Double.isFinite(v)) {
			w.value(v);
		} else {
			w.nullValue();
		}
	}
}
