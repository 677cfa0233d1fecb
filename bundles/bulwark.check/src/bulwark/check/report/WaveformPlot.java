package bulwark.check.report;

import java.util.Locale;

import bulwark.check.WaveformTrace;
import bulwark.check.figures.Figures;

/**
 * A part's voltage (solid, left scale) and current (dashed, right scale) over one cycle of a waveform case,
 * as inline SVG, each on a scale symmetric about zero and labelled with its peak. No script, no fetched file.
 */
final class WaveformPlot {
	static final int WIDTH = 560, HEIGHT = 220, LEFT = 64, RIGHT = 64, TOP = 10, BOTTOM = 34;
	private static final String VOLTS = "#2f5d8a", AMPS = "#c8963e";

	private WaveformPlot() {
	}

	static String svg(WaveformTrace t) {
		double plotW = WIDTH - LEFT - RIGHT, plotH = HEIGHT - TOP - BOTTOM;
		double end = t.seconds().length == 0 ? 1 : t.seconds()[t.seconds().length - 1];
		double vMax = peak(t.volts()), iMax = peak(t.amps());
		StringBuilder s = new StringBuilder(String.format(Locale.ROOT,
				"<svg width=\"%d\" height=\"%d\" role=\"img\" font-size=\"11\"><title>waveform of %s in %s</title>", WIDTH,
				HEIGHT, HtmlReport.escape(t.part()), HtmlReport.escape(t.caseName())));
		s.append(String.format(Locale.ROOT, "<rect x=\"%d\" y=\"%d\" width=\"%.0f\" height=\"%.0f\" fill=\"none\" stroke=\"#999\"/>",
				LEFT, TOP, plotW, plotH));
		double zero = TOP + plotH / 2;
		s.append(String.format(Locale.ROOT, "<line x1=\"%d\" y1=\"%.1f\" x2=\"%.0f\" y2=\"%.1f\" stroke=\"#ccc\"/>", LEFT, zero,
				LEFT + plotW, zero));
		s.append(label(LEFT - 4, TOP + 10, "end", VOLTS, Figures.engineering(vMax, "V")));
		s.append(label(LEFT - 4, (int) (TOP + plotH), "end", VOLTS, Figures.engineering(-vMax, "V")));
		s.append(label((int) (LEFT + plotW + 4), TOP + 10, "start", AMPS, Figures.engineering(iMax, "A")));
		s.append(label((int) (LEFT + plotW + 4), (int) (TOP + plotH), "start", AMPS, Figures.engineering(-iMax, "A")));
		s.append(label(LEFT, HEIGHT - BOTTOM + 14, "start", "#000", "0 s"));
		s.append(label((int) (LEFT + plotW), HEIGHT - BOTTOM + 14, "end", "#000", Figures.engineering(end, "s")));
		s.append(label((int) (LEFT + plotW / 2), HEIGHT - 6, "middle", "#000",
				"voltage across " + t.part() + " (solid) and current through it (dashed) over the cycle"));
		s.append(polyline(t.seconds(), t.volts(), end, vMax, plotW, plotH, VOLTS, ""));
		s.append(polyline(t.seconds(), t.amps(), end, iMax, plotW, plotH, AMPS, " stroke-dasharray=\"5,3\""));
		return s.append("</svg>\n").toString();
	}

	private static double peak(double[] values) {
		double p = 0;
		for (double v : values) {
			p = Math.max(p, Math.abs(v));
		}
		return p > 0 ? p : 1;
	}

	private static String polyline(double[] t, double[] y, double end, double max, double plotW, double plotH,
			String colour, String dash) {
		StringBuilder points = new StringBuilder();
		for (int k = 0; k < t.length; k++) {
			points.append(String.format(Locale.ROOT, "%.1f,%.1f ", LEFT + t[k] / end * plotW,
					TOP + plotH / 2 - y[k] / max * plotH / 2));
		}
		return String.format(Locale.ROOT, "<polyline points=\"%s\" fill=\"none\" stroke=\"%s\" stroke-width=\"1.5\"%s/>",
				points.toString().trim(), colour, dash);
	}

	private static String label(int x, int y, String anchor, String colour, String text) {
		return String.format(Locale.ROOT, "<text x=\"%d\" y=\"%d\" text-anchor=\"%s\" fill=\"%s\">%s</text>", x, y, anchor,
				colour, HtmlReport.escape(text));
	}
}
