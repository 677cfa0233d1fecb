package bulwark.ui.topology;

import java.util.Locale;
import java.util.Map;
import java.util.Set;

import org.eclipse.swt.graphics.RGB;

import bulwark.ui.stress.UtilisationScale;

/**
 * The topology as a standalone SVG picture for reports and reviews: the same layout, fills and outlines as
 * the view (TopologyView), with the highlighted reverse path drawn heavily in the highlight colour.
 */
public final class TopologySvg {
	static final RGB WIRE = new RGB(64, 64, 64);
	/** The highlighted path: a violet no stress fill uses. */
	static final RGB HIGHLIGHT = new RGB(106, 27, 154);
	static final int MARGIN = 10;

	private TopologySvg() {
	}

	/**
	 * @param worst       worst utilisation per part (absent: not judged)
	 * @param heavy       parts on any reverse path, outlined heavily
	 * @param highlighted steps of the selected path: terminals, parts and "net NAME"
	 */
	public static String of(TopologyLayout.Drawing d, Map<String, Double> worst, Set<String> heavy, Set<String> highlighted) {
		StringBuilder svg = new StringBuilder();
		svg.append(String.format(Locale.ROOT,
				"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"%.0f\" height=\"%.0f\" font-family=\"sans-serif\" font-size=\"11\">\n",
				d.width() + 2 * MARGIN, d.height() + 2 * MARGIN));
		svg.append("<title>Circuit topology</title>\n<rect width=\"100%\" height=\"100%\" fill=\"white\"/>\n");
		for (TopologyLayout.Wire w : d.wires()) {
			boolean on = onPath(highlighted, w);
			svg.append("<polyline fill=\"none\" stroke=\"").append(hex(on ? HIGHLIGHT : WIRE)).append("\" stroke-width=\"")
					.append(on ? 3 : 1).append("\" points=\"");
			for (double[] p : w.points()) {
				svg.append(String.format(Locale.ROOT, "%.1f,%.1f ", p[0] + MARGIN, p[1] + MARGIN));
			}
			svg.append("\"/>\n");
		}
		for (TopologyLayout.Box b : d.boxes()) {
			double x = b.x() + MARGIN, y = b.y() + MARGIN;
			if (b.kind().equals("net")) {
				boolean on = highlighted.contains("net " + b.name());
				svg.append(String.format(Locale.ROOT, "<circle cx=\"%.1f\" cy=\"%.1f\" r=\"%d\" fill=\"%s\"/>\n", x + 5, y + 5,
						on ? 5 : 3, hex(on ? HIGHLIGHT : WIRE)));
				svg.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%.1f\">%s</text>\n", x + 10, y - 2, escape(b.name())));
				continue;
			}
			Double u = worst.get(b.name());
			boolean on = highlighted.contains(b.name());
			svg.append(String.format(Locale.ROOT,
					"<rect data-name=\"%s\" x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\" rx=\"%d\" fill=\"%s\" stroke=\"%s\" stroke-width=\"%d\">",
					escape(b.name()), x, y, b.width(), b.height(), b.kind().equals("terminal") ? 6 : 0,
					u == null ? "#ffffff" : hex(UtilisationScale.of(u)), hex(on ? HIGHLIGHT : WIRE),
					on || heavy.contains(b.name()) ? 3 : 1));
			svg.append("<title>").append(escape(b.name()));
			if (u != null) {
				svg.append(String.format(Locale.ROOT, ": worst %.0f %% of its derated rating", 100 * u));
			}
			svg.append("</title></rect>\n");
			String ink = u != null && u > 1.3 ? "#ffffff" : hex(WIRE);
			svg.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%.1f\" fill=\"%s\">%s</text>\n", x + 4, y + 13, ink,
					escape(b.name())));
			svg.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%.1f\" fill=\"%s\">%s</text>\n", x + 4,
					y + b.height() / 2 + 12, ink, escape(b.kind())));
		}
		return svg.append("</svg>\n").toString();
	}

	/** A wire is on the path when both its part (or terminal) and its net are. */
	static boolean onPath(Set<String> highlighted, TopologyLayout.Wire w) {
		return highlighted.contains(w.part()) && highlighted.contains("net " + w.net());
	}

	private static String hex(RGB c) {
		return String.format(Locale.ROOT, "#%02x%02x%02x", c.red, c.green, c.blue);
	}

	private static String escape(String s) {
		return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
	}
}
