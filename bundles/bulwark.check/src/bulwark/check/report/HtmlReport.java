package bulwark.check.report;

import java.io.IOException;
import java.io.Writer;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import bulwark.check.cases.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.cases.PartStress;
import bulwark.check.WaveformTrace;
import bulwark.check.function.FunctionFigures;
import bulwark.check.function.PairFigures;

/**
 * One self-contained HTML page per run (no script, no link, nothing fetched): per design its status, the
 * findings, each part's worst utilisation as a bar (inline SVG), and the cases; the safety caution on top.
 * Every string from a design is escaped.
 */
public final class HtmlReport {
	/** Bar colours of our own: calm below 80 % of the rating, amber to 100 %, red beyond. */
	private static final String OK = "#4a7c59", NEAR = "#c8963e", OVER = "#b23a48";

	private HtmlReport() {
	}

	public static void write(List<DesignResult> results, String version, String caution, Writer w) throws IOException {
		write(results, version, caution, "Bulwark report", w);
	}

	/** @param title the page's title, as a browser's tab shows it (a classroom page: the design's title) */
	public static void write(List<DesignResult> results, String version, String caution, String title, Writer w)
			throws IOException {
		w.write("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>" + escape(title)
				+ "</title>\n<style>");
		w.write("body{font-family:sans-serif;margin:2em;max-width:70em}table{border-collapse:collapse;margin:.5em 0}"
				+ "td,th{border:1px solid #bbb;padding:.2em .5em;text-align:left;vertical-align:top}"
				+ ".caution{border:2px solid #b23a48;padding:.6em}.pass{color:#4a7c59}.pass-unchecked{color:#8a6d1f}.fail,.error{color:#b23a48}"
				+ ".waived{color:#777}");
		w.write("</style></head><body>\n<h1>Bulwark report</h1>\n");
		w.write("<p class=\"caution\"><strong>" + escape(caution) + "</strong></p>\n");
		w.write("<p>bulwark " + escape(version) + " — " + results.size() + " design(s)</p>\n");
		if (results.size() > 1) {
			// an index first: which designs failed, before scrolling through any of them
			w.write("<table><tr><th>design</th><th>status</th><th>summary</th></tr>\n");
			for (int i = 0; i < results.size(); i++) {
				DesignResult r = results.get(i);
				w.write("<tr><td><a href=\"#design-" + (i + 1) + "\">" + escape(r.title() == null ? r.file() : r.title())
						+ "</a></td><td class=\"" + r.status().id() + "\">" + r.status().label() + "</td><td>"
						+ escape(summary(r)) + "</td></tr>\n");
			}
			w.write("</table>\n");
		}
		for (int i = 0; i < results.size(); i++) {
			design(results.get(i), i + 1, w);
		}
		w.write("</body></html>\n");
		w.flush();
	}

	/** "2 errors, 1 warning, 1 waived; most used: R_DROP at 1280 % of its power limit". */
	static String summary(DesignResult r) {
		long waived = r.findings().stream().filter(Finding::waived).count();
		StringBuilder s = new StringBuilder(String.format(Locale.ROOT, "%d error(s), %d warning(s), %d waived",
				r.count(bulwark.check.finding.Severity.ERROR), r.count(bulwark.check.finding.Severity.WARNING), waived));
		r.stresses().stream().filter(x -> x.utilisation() != null)
				.max(java.util.Comparator.comparingDouble(bulwark.check.WorstStress::utilisation))
				.ifPresent(x -> s.append(String.format(Locale.ROOT, "; most used: %s at %.0f %% of its %s limit", x.part(),
						100 * x.utilisation(), x.rating())));
		return s.toString();
	}

	private static void design(DesignResult r, int number, Writer w) throws IOException {
		w.write("<h2 id=\"design-" + number + "\">" + escape(r.title() == null ? r.file() : r.title()) + " <span class=\""
				+ r.status().id() + "\">" + r.status().label() + "</span></h2>\n<p>" + escape(r.file())
				+ (r.policy() == null ? "" : " — review policy '" + escape(r.policy()) + "'") + "</p>\n<p>"
				+ escape(summary(r)) + "</p>\n");
		if (r.findings().isEmpty()) {
			w.write("<p>No findings.</p>\n");
		} else {
			w.write("<table><tr><th>line:col</th><th>severity</th><th>rule</th><th>part</th><th>case</th><th>message</th></tr>\n");
			for (Finding f : r.findings()) {
				w.write("<tr" + (f.waived() ? " class=\"waived\"" : "") + "><td>" + f.location().line() + ":" + f.location().column() + "</td><td>"
						+ f.severity().id() + (f.waived() ? " (waived)" : "") + "</td><td>" + escape(f.rule().text()) + "</td><td>"
						+ escape(f.part() == null ? "" : f.part()) + "</td><td>" + escape(f.caseName() == null ? "" : f.caseName())
						+ "</td><td>" + escape(f.message()) + "</td></tr>\n");
			}
			w.write("</table>\n");
		}
		Map<String, PartStress> worst = new LinkedHashMap<>();
		Map<String, String> worstCase = new LinkedHashMap<>();
		for (CaseResult c : r.cases()) {
			for (PartStress p : c.parts()) {
				if (p.utilisation() != null && (!worst.containsKey(p.part()) || p.utilisation() > worst.get(p.part()).utilisation())) {
					worst.put(p.part(), p);
					worstCase.put(p.part(), c.name());
				}
			}
		}
		if (!worst.isEmpty()) {
			w.write("<h3>Worst utilisation of each rated part</h3>\n");
			w.write(bars(worst, worstCase));
		}
		function(r.function(), w);
		for (WaveformTrace t : r.waveforms()) {
			w.write("<h4>" + escape(t.part()) + " over the cycle, " + escape(t.caseName()) + "</h4>\n");
			w.write(WaveformPlot.svg(t));
			w.write("<p class=\"method\">Solved by " + escape(t.method()) + ".</p>\n");
		}
		if (!r.cases().isEmpty()) {
			w.write("<h3>Cases</h3>\n<ul>");
			for (CaseResult c : r.cases()) {
				w.write("<li>" + escape(c.name()) + " (" + escape(c.kind()) + "): "
						+ (c.converged() ? "solved" : "<strong>not solved</strong>") + "</li>");
			}
			w.write("</ul>\n");
		}
	}

	/** "12 V (TIP +), 12 V (COM +)": the DC voltage the indicator comes on at, either way round. */
	private static String switchOn(PairFigures p) {
		List<String> shown = new java.util.ArrayList<>();
		if (p.forward().onVolts() != null) {
			shown.add(show(p.forward().onVolts(), "V") + " (" + escape(p.from()) + " +)");
		}
		if (p.reverse().onVolts() != null) {
			shown.add(show(p.reverse().onVolts(), "V") + " (" + escape(p.to()) + " +)");
		}
		return shown.isEmpty() ? "—" : String.join(", ", shown);
	}

	private static void function(FunctionFigures f, Writer w) throws IOException {
		if (f.pairs().isEmpty() && f.standbyAmps() == null) {
			return;
		}
		w.write("<h3>Function at the terminals</h3>\n<table><tr><th>terminals</th><th>threshold</th><th>hysteresis</th>"
				+ "<th>test current</th><th>open-circuit voltage</th><th>comes on at</th><th>lights LEDs</th></tr>\n");
		for (PairFigures p : f.pairs()) {
			w.write("<tr><td>" + escape(p.from() + "–" + p.to()) + "</td><td>" + show(p.thresholdOhms(), "Ω") + "</td><td>"
					+ (Double.valueOf(0).equals(p.hysteresisOhms()) ? "none" : show(p.hysteresisOhms(), "Ω")) + "</td><td>" + current(p.testCurrentAmps()) + "</td><td>"
					+ show(p.openVolts(), "V") + "</td><td>" + switchOn(p) + "</td><td>"
					+ escape(String.join(", ", p.lightsLeds())) + "</td></tr>\n");
		}
		w.write("</table>\n");
		if (f.standbyAmps() != null) {
			w.write("<p>Standby current " + show(f.standbyAmps(), "A") + (f.batteryLifeHours() == null ? ""
					: Double.isInfinite(f.batteryLifeHours()) ? "; the battery is not drawn on"
							: String.format(Locale.ROOT, "; battery life %.0f h (%.1f years)", f.batteryLifeHours(),
									f.batteryLifeHours() / 8766))
					+ ".</p>\n");
		}
		for (PairFigures p : f.pairs()) {
			if (!p.rising().isEmpty()) {
				w.write("<h4>Threshold sweep, " + escape(p.from() + "–" + p.to()) + " (indicator " + escape(f.indicator())
						+ "; thick where it is on)</h4>\n");
				w.write(SweepPlot.svg(p));
			}
		}
	}

	/**
	 * Below a nanoampere, a current is what the junctions' minimum conductance (1 pS each, the engine's GMIN)
	 * leaks at a few volts: solver noise, shown as ≈ 0 with the resolution that decided it.
	 */
	static final double NOISE_AMPS = 1e-9;

	private static String current(double amps) {
		return Math.abs(amps) < NOISE_AMPS ? "≈ 0 (below 1 nA)" : show(amps, "A");
	}

	private static String show(Double value, String unit) {
		return value == null ? "—" : escape(bulwark.check.figures.Figures.engineering(value, unit));
	}

	/** Horizontal bars, 100 % of the rating marked by a line, longer bars clipped at 200 % with the figure beside. */
	static String bars(Map<String, PartStress> worst, Map<String, String> worstCase) {
		int row = 22, width = 400;
		// wide enough for the longest name and the longest figure beside its bar: no label is ever cut off
		// [common practice: 7 px a character is the width of sans-serif at 12 px, with room to spare]
		int longestName = worst.keySet().stream().mapToInt(String::length).max().orElse(0);
		int longestFigure = worst.entrySet().stream()
				.mapToInt(e -> barFigure(e.getValue(), worstCase.get(e.getKey())).length()).max().orElse(0);
		int label = Math.max(110, 7 * longestName + 10);
		StringBuilder svg = new StringBuilder(String.format(Locale.ROOT,
				"<svg width=\"%d\" height=\"%d\" role=\"img\" font-size=\"12\">",
				label + width + 6 + 7 * longestFigure + 10, row * worst.size() + 10));
		int y = 5;
		for (Map.Entry<String, PartStress> e : worst.entrySet()) {
			double u = e.getValue().utilisation();
			double shown = Math.min(u, 2.0);
			String colour = u > 1 ? OVER : u > 0.8 ? NEAR : OK;
			svg.append(String.format(Locale.ROOT, "<text x=\"0\" y=\"%d\">%s</text>", y + 14, escape(e.getKey())));
			svg.append(String.format(Locale.ROOT, "<rect x=\"%d\" y=\"%d\" width=\"%.1f\" height=\"16\" fill=\"%s\"/>", label,
					y, shown / 2 * width, colour));
			svg.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%d\">%s</text>", label + width + 6,
					y + 14, escape(barFigure(e.getValue(), worstCase.get(e.getKey())))));
			y += row;
		}
		svg.append(String.format(Locale.ROOT, "<line x1=\"%d\" y1=\"0\" x2=\"%d\" y2=\"%d\" stroke=\"#333\"/>",
				label + width / 2, label + width / 2, y));
		return svg.append("</svg>\n").toString();
	}

	/** "231 % (power, case)", or past ten times the limit the factor: "51,200× (charge, case)". */
	private static String barFigure(PartStress p, String caseName) {
		double u = p.utilisation();
		String share = u > 10 ? bulwark.check.figures.Figures.factor(u) : String.format(Locale.ROOT, "%.0f %%", 100 * u);
		return share + " (" + p.limiting() + ", " + caseName + ")";
	}

	/** Escapes text for HTML element content and attribute values. */
	public static String escape(String s) {
		StringBuilder out = new StringBuilder(s.length());
		for (char c : Printable.of(s).toCharArray()) {
			switch (c) {
			case '<' -> out.append("&lt;");
			case '>' -> out.append("&gt;");
			case '&' -> out.append("&amp;");
			case '"' -> out.append("&quot;");
			case '\'' -> out.append("&#39;");
			default -> out.append(c);
			}
		}
		return out.toString();
	}
}
