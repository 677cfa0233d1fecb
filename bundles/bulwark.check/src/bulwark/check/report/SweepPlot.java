package bulwark.check.report;

import java.util.List;
import java.util.Locale;

import bulwark.check.function.PairFigures;
import bulwark.check.function.SweepPoint;
import bulwark.check.figures.Figures;

/**
 * The threshold sweep as inline SVG: the current into the resistance under test against that resistance,
 * both on logarithmic axes, for the rising sweep (solid) and the falling one (dashed); where the indicator is
 * on the trace is drawn thick, and each switching point is marked with its value. No script, no fetched file.
 */
final class SweepPlot {
	static final int WIDTH = 560, HEIGHT = 260, LEFT = 60, BOTTOM = 40, TOP = 10, RIGHT = 10;
	private static final String RISING = "#2f5d8a", FALLING = "#c8963e";

	private SweepPlot() {
	}

	static String svg(PairFigures p) {
		List<SweepPoint> all = new java.util.ArrayList<>(p.rising());
		all.addAll(p.falling());
		double minX = Math.log10(all.stream().mapToDouble(SweepPoint::ohms).min().orElse(1e-3));
		double maxX = Math.log10(all.stream().mapToDouble(SweepPoint::ohms).max().orElse(1e9));
		double minY = Math.floor(Math.log10(Math.max(1e-12, all.stream().mapToDouble(SweepPoint::amps).filter(a -> a > 0).min().orElse(1e-9))));
		double maxY = Math.ceil(Math.log10(Math.max(1e-12, all.stream().mapToDouble(SweepPoint::amps).max().orElse(1))));
		if (maxY <= minY) {
			maxY = minY + 1;
		}
		StringBuilder s = new StringBuilder(String.format(Locale.ROOT,
				"<svg width=\"%d\" height=\"%d\" role=\"img\" font-size=\"11\"><title>threshold sweep %s–%s</title>", WIDTH,
				HEIGHT, HtmlReport.escape(p.from()), HtmlReport.escape(p.to())));
		double plotW = WIDTH - LEFT - RIGHT, plotH = HEIGHT - TOP - BOTTOM;
		s.append(String.format(Locale.ROOT, "<rect x=\"%d\" y=\"%d\" width=\"%.0f\" height=\"%.0f\" fill=\"none\" stroke=\"#999\"/>",
				LEFT, TOP, plotW, plotH));
		for (int d = (int) Math.ceil(minX); d <= Math.floor(maxX); d += 2) {
			double x = LEFT + (d - minX) / (maxX - minX) * plotW;
			s.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%d\" text-anchor=\"middle\">%s</text>", x,
					HEIGHT - BOTTOM + 14, HtmlReport.escape(Figures.engineering(Math.pow(10, d), "Ω"))));
		}
		for (int d = (int) minY; d <= maxY; d += Math.max(1, (int) ((maxY - minY) / 5))) {
			double y = TOP + plotH - (d - minY) / (maxY - minY) * plotH;
			s.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%.1f\" text-anchor=\"end\">%s</text>", LEFT - 4, y + 4,
					HtmlReport.escape(Figures.engineering(Math.pow(10, d), "A"))));
		}
		s.append(String.format(Locale.ROOT, "<text x=\"%.0f\" y=\"%d\" text-anchor=\"middle\">resistance between %s and %s</text>",
				LEFT + plotW / 2, HEIGHT - 6, HtmlReport.escape(p.from()), HtmlReport.escape(p.to())));
		trace(s, p.rising(), RISING, "", minX, maxX, minY, maxY, plotW, plotH);
		trace(s, p.falling(), FALLING, " stroke-dasharray=\"5,3\"", minX, maxX, minY, maxY, plotW, plotH);
		mark(s, p.risingOhms(), "rising " , RISING, minX, maxX, plotW, plotH, 0);
		mark(s, p.fallingOhms(), "falling ", FALLING, minX, maxX, plotW, plotH, 14);
		return s.append("</svg>\n").toString();
	}

	private static void trace(StringBuilder s, List<SweepPoint> points, String colour, String dash, double minX,
			double maxX, double minY, double maxY, double plotW, double plotH) {
		for (int i = 1; i < points.size(); i++) {
			SweepPoint a = points.get(i - 1), b = points.get(i);
			s.append(String.format(Locale.ROOT,
					"<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"%s\" stroke-width=\"%d\"%s/>",
					x(a, minX, maxX, plotW), y(a, minY, maxY, plotH), x(b, minX, maxX, plotW), y(b, minY, maxY, plotH), colour,
					a.on() && b.on() ? 3 : 1, dash));
		}
	}

	private static void mark(StringBuilder s, Double ohms, String label, String colour, double minX, double maxX,
			double plotW, double plotH, int dy) {
		if (ohms == null) {
			return;
		}
		double x = LEFT + (Math.log10(ohms) - minX) / (maxX - minX) * plotW;
		s.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" y1=\"%d\" x2=\"%.1f\" y2=\"%.0f\" stroke=\"%s\"/>", x, TOP, x,
				TOP + plotH, colour));
		s.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%d\" fill=\"%s\">%s%s</text>", x + 3, TOP + 12 + dy, colour,
				label, HtmlReport.escape(Figures.engineering(ohms, "Ω"))));
	}

	private static double x(SweepPoint p, double minX, double maxX, double plotW) {
		return LEFT + (Math.log10(p.ohms()) - minX) / (maxX - minX) * plotW;
	}

	private static double y(SweepPoint p, double minY, double maxY, double plotH) {
		double v = Math.log10(Math.max(p.amps(), Math.pow(10, minY)));
		return TOP + plotH - (v - minY) / (maxY - minY) * plotH;
	}
}
