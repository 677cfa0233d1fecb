package bulwark.ui.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BiConsumer;

import org.eclipse.jface.action.Action;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.part.ViewPart;

import bulwark.check.DesignResult;
import bulwark.check.function.PairFigures;
import bulwark.check.function.SweepPoint;
import bulwark.check.figures.Figures;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.findings.FindingsHub;

/**
 * The threshold sweep of the design being edited, drawn with SWT: the current into the resistance under test
 * against that resistance (both logarithmic), rising sweep solid, falling dashed, thick where the indicator is
 * on, each switching point marked, and the indicator's state as a band per sweep along the bottom (on where
 * filled; where the bands differ is the hysteresis). Moving the pointer reads the resistance under it and the currents of both
 * sweeps there. The wheel zooms the resistance axis about the pointer, dragging zooms to the dragged span,
 * double-click shows the whole sweep again; "Zoom to the switching points" frames the hysteresis loop.
 */
public class SweepView extends ViewPart {
	public static final String ID = "bulwark.ui.sweep";
	static final int LEFT = 70, RIGHT = 16, TOP = 12, BOTTOM = 36;

	private Canvas canvas;
	private Label readout;
	private PairFigures pair;
	private String indicator;
	/** The resistance axis shown, log10 Ω, or null for the whole sweep. */
	private double[] window;
	private int dragFrom = -1, dragTo = -1;
	private final BiConsumer<DesignEditor, DesignResult> listener = this::show;

	@Override
	public void createPartControl(Composite parent) {
		parent.setLayout(new GridLayout(1, false));
		canvas = new Canvas(parent, SWT.DOUBLE_BUFFERED);
		canvas.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
		canvas.addPaintListener(e -> paint(e.gc, canvas.getClientArea()));
		readout = new Label(parent, SWT.NONE);
		readout.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
		readout.setText("No threshold sweep: check a design whose indicator switches across its terminals.");
		canvas.addMouseMoveListener(e -> {
			read(e.x);
			if (dragFrom >= 0) {
				dragTo = e.x;
				canvas.redraw();
			}
		});
		canvas.addListener(SWT.MouseVerticalWheel, e -> zoomAbout(e.x, e.count > 0 ? 0.8 : 1.25));
		canvas.addListener(SWT.MouseDown, e -> {
			if (e.button == 1 && pair != null) {
				dragFrom = e.x;
				dragTo = e.x;
			}
		});
		canvas.addListener(SWT.MouseUp, e -> {
			if (dragFrom >= 0 && Math.abs(e.x - dragFrom) > 4) {
				double[] x = xRange();
				int w = canvas.getClientArea().width - LEFT - RIGHT;
				double a = x[0] + (double) (Math.min(dragFrom, e.x) - LEFT) / w * (x[1] - x[0]);
				double b = x[0] + (double) (Math.max(dragFrom, e.x) - LEFT) / w * (x[1] - x[0]);
				zoom(Math.pow(10, a), Math.pow(10, b));
			}
			dragFrom = -1;
			canvas.redraw();
		});
		canvas.addListener(SWT.MouseDoubleClick, e -> resetZoom());
		getViewSite().getActionBars().getToolBarManager().add(new Action("Zoom to the switching points") {
			@Override
			public void run() {
				zoomToSwitching();
			}
		});
		getViewSite().getActionBars().getToolBarManager().add(new Action("Whole sweep") {
			@Override
			public void run() {
				resetZoom();
			}
		});
		FindingsHub.subscribe(listener);
	}

	/** Shows the resistances from lo to hi (clamped to the sweep; at least a twentieth of a decade). */
	public void zoom(double loOhms, double hiOhms) {
		if (pair == null) {
			return;
		}
		double[] full = range(false);
		double lo = Math.max(full[0], Math.log10(loOhms)), hi = Math.min(full[1], Math.log10(hiOhms));
		if (hi - lo < 0.05) {
			double mid = (lo + hi) / 2;
			lo = Math.max(full[0], mid - 0.025);
			hi = Math.min(full[1], mid + 0.025);
		}
		window = lo <= full[0] && hi >= full[1] ? null : new double[] { lo, hi };
		canvas.redraw();
	}

	/** A third of a decade either side of the switching points: the hysteresis loop fills the plot. */
	public void zoomToSwitching() {
		if (pair == null || pair.risingOhms() == null) {
			return;
		}
		double a = pair.risingOhms(), b = pair.fallingOhms() == null ? a : pair.fallingOhms();
		zoom(Math.min(a, b) / 2, Math.max(a, b) * 2);
	}

	public void resetZoom() {
		window = null;
		canvas.redraw();
	}

	/** The resistances shown, in ohms, for tests. */
	public double[] shownOhms() {
		double[] x = xRange();
		return new double[] { Math.pow(10, x[0]), Math.pow(10, x[1]) };
	}

	private void zoomAbout(int mouseX, double factor) {
		if (pair == null) {
			return;
		}
		double[] x = xRange();
		int w = canvas.getClientArea().width - LEFT - RIGHT;
		double at = x[0] + Math.min(1, Math.max(0, (double) (mouseX - LEFT) / w)) * (x[1] - x[0]);
		zoom(Math.pow(10, at - (at - x[0]) * factor), Math.pow(10, at + (x[1] - at) * factor));
	}

	private double[] xRange() {
		return window != null ? window : range(false);
	}

	private void show(DesignEditor from, DesignResult result) {
		if (canvas == null || canvas.isDisposed() || from.isClosed()) {
			return;
		}
		PairFigures was = pair;
		pair = result.function().pairs().stream().filter(p -> !p.rising().isEmpty()).findFirst().orElse(null);
		if (pair == null || was == null || !pair.from().equals(was.from()) || !pair.to().equals(was.to())) {
			window = null; // a zoom stays while the same pair is edited
		}
		indicator = result.function().indicator();
		setContentDescription(pair == null ? "No threshold sweep for this design."
				: "Threshold sweep " + pair.from() + "–" + pair.to() + ", indicator " + indicator
						+ " (thick, and banded along the bottom, where it is on; solid rising, dashed falling)");
		readout.setText(pair == null ? "No threshold sweep: check a design whose indicator switches across its terminals."
				: "Move the pointer over the plot to read the resistance and both sweeps' currents there.");
		canvas.redraw();
	}

	/** The figures drawn, for tests. */
	public PairFigures shownPair() {
		return pair;
	}

	private double[] range(boolean y) {
		List<SweepPoint> all = new ArrayList<>(pair.rising());
		all.addAll(pair.falling());
		double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
		for (SweepPoint p : all) {
			double v = y ? Math.max(p.amps(), 1e-12) : p.ohms();
			lo = Math.min(lo, Math.log10(v));
			hi = Math.max(hi, Math.log10(v));
		}
		if (y) {
			lo = Math.floor(lo);
			hi = Math.max(Math.ceil(hi), lo + 1);
		}
		return new double[] { lo, hi };
	}

	private void paint(GC gc, Rectangle area) {
		if (pair == null) {
			return;
		}
		double[] x = xRange(), y = range(true);
		int w = area.width - LEFT - RIGHT, h = area.height - TOP - BOTTOM;
		if (w < 20 || h < 20) {
			return;
		}
		gc.setAntialias(SWT.ON);
		gc.setForeground(canvas.getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
		gc.drawRectangle(LEFT, TOP, w, h);
		for (double tick : AxisTicks.logarithmic(x[0], x[1])) {
			int px = LEFT + (int) ((tick - x[0]) / (x[1] - x[0]) * w);
			gc.drawLine(px, TOP + h, px, TOP + h + 4);
			gc.drawText(Figures.engineering(Math.pow(10, tick), "Ω"), px - 14, TOP + h + 6, true);
		}
		if (dragFrom >= 0 && dragTo != dragFrom) {
			gc.setBackground(canvas.getDisplay().getSystemColor(SWT.COLOR_GRAY));
			gc.setAlpha(80);
			gc.fillRectangle(Math.min(dragFrom, dragTo), TOP, Math.abs(dragTo - dragFrom), h);
			gc.setAlpha(255);
		}
		gc.setClipping(LEFT, TOP, w + 1, h + 1);
		for (int d = (int) y[0]; d <= y[1]; d += Math.max(1, (int) ((y[1] - y[0]) / 5))) {
			int py = TOP + h - (int) ((d - y[0]) / (y[1] - y[0]) * h);
			gc.drawText(Figures.engineering(Math.pow(10, d), "A"), 4, py - 7, true);
		}
		Color rising = new Color(47, 93, 138), falling = new Color(200, 150, 62);
		try {
			trace(gc, pair.rising(), rising, SWT.LINE_SOLID, x, y, w, h);
			trace(gc, pair.falling(), falling, SWT.LINE_DASH, x, y, w, h);
			mark(gc, pair.risingOhms(), rising, x, w, h, 0);
			mark(gc, pair.fallingOhms(), falling, x, w, h, 16);
			// the indicator's state, one band per sweep along the bottom: where they differ is the hysteresis
			band(gc, pair.rising(), pair.risingOhms(), rising, x, w, TOP + h - 2 * BAND - 3);
			band(gc, pair.falling(), pair.fallingOhms(), falling, x, w, TOP + h - BAND - 1);
		} finally {
			gc.setClipping((Rectangle) null);
			rising.dispose();
			falling.dispose();
		}
	}

	private static void trace(GC gc, List<SweepPoint> points, Color colour, int style, double[] x, double[] y, int w, int h) {
		gc.setForeground(colour);
		gc.setLineStyle(style);
		for (int i = 1; i < points.size(); i++) {
			SweepPoint a = points.get(i - 1), b = points.get(i);
			gc.setLineWidth(a.on() && b.on() ? 3 : 1);
			gc.drawLine(px(a, x, w), py(a, y, h), px(b, x, w), py(b, y, h));
		}
		gc.setLineWidth(1);
		gc.setLineStyle(SWT.LINE_SOLID);
	}

	/** Height of an indicator-state band, pixels. */
	static final int BAND = 6;

	/** Filled where the indicator is on; a segment that switches is filled up to the bisected switching point. */
	private static void band(GC gc, List<SweepPoint> points, Double switchOhms, Color colour, double[] x, int w, int y) {
		gc.setBackground(colour);
		for (int i = 1; i < points.size(); i++) {
			SweepPoint a = points.get(i - 1), b = points.get(i);
			if (!a.on() && !b.on()) {
				continue;
			}
			int x0 = px(a, x, w), x1 = px(b, x, w);
			if (a.on() != b.on()) {
				if (switchOhms == null || switchOhms < Math.min(a.ohms(), b.ohms()) || switchOhms > Math.max(a.ohms(), b.ohms())) {
					continue; // a switch this sweep's bisection did not place here
				}
				int xs = LEFT + (int) ((Math.log10(switchOhms) - x[0]) / (x[1] - x[0]) * w);
				if (a.on()) {
					x1 = xs;
				} else {
					x0 = xs;
				}
			}
			gc.fillRectangle(Math.min(x0, x1), y, Math.abs(x1 - x0) + 1, BAND);
		}
	}

	private static void mark(GC gc, Double ohms, Color colour, double[] x, int w, int h, int dy) {
		if (ohms == null) {
			return;
		}
		int px = LEFT + (int) ((Math.log10(ohms) - x[0]) / (x[1] - x[0]) * w);
		gc.setForeground(colour);
		gc.drawLine(px, TOP, px, TOP + h);
		gc.drawText(Figures.engineering(ohms, "Ω"), px + 3, TOP + 2 + dy, true);
	}

	private static int px(SweepPoint p, double[] x, int w) {
		return LEFT + (int) ((Math.log10(p.ohms()) - x[0]) / (x[1] - x[0]) * w);
	}

	private static int py(SweepPoint p, double[] y, int h) {
		double v = Math.log10(Math.max(p.amps(), Math.pow(10, y[0])));
		return TOP + h - (int) ((v - y[0]) / (y[1] - y[0]) * h);
	}

	/** The resistance under the pointer, and both sweeps' currents there (nearest computed points). */
	private void read(int mouseX) {
		if (pair == null) {
			return;
		}
		double[] x = xRange();
		int w = canvas.getClientArea().width - LEFT - RIGHT;
		double ohms = Math.pow(10, x[0] + (double) (mouseX - LEFT) / w * (x[1] - x[0]));
		readout.setText(String.format(Locale.ROOT, "%s: rising %s, falling %s", Figures.engineering(ohms, "Ω"),
				nearest(pair.rising(), ohms), nearest(pair.falling(), ohms)));
	}

	private static String nearest(List<SweepPoint> points, double ohms) {
		SweepPoint best = null;
		for (SweepPoint p : points) {
			if (best == null || Math.abs(Math.log(p.ohms() / ohms)) < Math.abs(Math.log(best.ohms() / ohms))) {
				best = p;
			}
		}
		return best == null ? "—" : Figures.engineering(best.amps(), "A") + (best.on() ? " (on)" : " (off)");
	}

	@Override
	public void setFocus() {
		canvas.setFocus();
	}

	@Override
	public void dispose() {
		FindingsHub.unsubscribe(listener);
		super.dispose();
	}
}
