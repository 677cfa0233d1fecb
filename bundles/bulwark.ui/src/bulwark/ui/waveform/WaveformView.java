package bulwark.ui.waveform;

import java.util.List;
import java.util.Locale;
import java.util.function.BiConsumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.part.ViewPart;

import bulwark.check.DesignResult;
import bulwark.check.WaveformTrace;
import bulwark.check.figures.Figures;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.findings.FindingsHub;

/**
 * The waveform of each mains case over its steady cycle: the voltage across and the current through the part
 * the case stresses most, against time, voltage on the left axis and current on the right. A plot to look at;
 * every judged figure comes from the solved points, which the findings quote.
 */
public class WaveformView extends ViewPart {
	public static final String ID = "bulwark.ui.waveform";
	static final int LEFT = 76, RIGHT = 76, TOP = 14, BOTTOM = 36;

	private Combo choice;
	private Canvas canvas;
	private Label readout;
	private List<WaveformTrace> traces = List.of();
	private WaveformTrace shown;
	private final BiConsumer<DesignEditor, DesignResult> listener = this::show;

	@Override
	public void createPartControl(Composite parent) {
		parent.setLayout(new GridLayout(1, false));
		choice = new Combo(parent, SWT.READ_ONLY);
		choice.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
		choice.addListener(SWT.Selection, e -> select(choice.getSelectionIndex()));
		canvas = new Canvas(parent, SWT.DOUBLE_BUFFERED);
		canvas.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
		canvas.addPaintListener(e -> paint(e.gc, canvas.getClientArea()));
		canvas.addMouseMoveListener(e -> read(e.x));
		readout = new Label(parent, SWT.NONE);
		readout.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
		readout.setText("No waveform: check a design under a policy with mains.");
		FindingsHub.subscribe(listener);
	}

	private void show(DesignEditor from, DesignResult result) {
		if (canvas == null || canvas.isDisposed() || from.isClosed()) {
			return;
		}
		String was = shown == null ? null : shown.caseName();
		traces = result.waveforms();
		choice.removeAll();
		int keep = 0;
		for (int i = 0; i < traces.size(); i++) {
			WaveformTrace t = traces.get(i);
			choice.add(t.part() + " in '" + t.caseName() + "'");
			if (t.caseName().equals(was)) {
				keep = i; // the same case stays chosen while the design is edited
			}
		}
		select(traces.isEmpty() ? -1 : keep);
	}

	private void select(int index) {
		shown = index < 0 || index >= traces.size() ? null : traces.get(index);
		if (shown != null) {
			choice.select(index);
		}
		setContentDescription(shown == null ? "No mains case in this check."
				: "Voltage across " + shown.part() + " (solid, left axis) and current through it (dashed, right axis) over "
						+ "one steady cycle");
		readout.setText(shown == null ? "No waveform: check a design under a policy with mains."
				: String.format(Locale.ROOT, "Peaks: %s and %s. Move the pointer over the plot to read an instant.",
						Figures.engineering(peak(shown.volts()), "V"), Figures.engineering(peak(shown.amps()), "A")));
		canvas.redraw();
	}

	/** The trace drawn, for tests. */
	public WaveformTrace shownTrace() {
		return shown;
	}

	/** The traces on offer, for tests. */
	public List<WaveformTrace> traces() {
		return traces;
	}

	static double peak(double[] values) {
		double p = 0;
		for (double v : values) {
			p = Math.max(p, Math.abs(v));
		}
		return p;
	}

	private void paint(GC gc, Rectangle area) {
		if (shown == null) {
			return;
		}
		int w = area.width - LEFT - RIGHT, h = area.height - TOP - BOTTOM;
		if (w < 20 || h < 20) {
			return;
		}
		double[] t = shown.seconds();
		double end = t[t.length - 1];
		double vMax = Math.max(peak(shown.volts()), 1e-12), iMax = Math.max(peak(shown.amps()), 1e-15);
		gc.setAntialias(SWT.ON);
		Color grey = canvas.getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY);
		gc.setForeground(grey);
		gc.drawRectangle(LEFT, TOP, w, h);
		int zero = TOP + h / 2;
		gc.setLineStyle(SWT.LINE_DOT);
		gc.drawLine(LEFT, zero, LEFT + w, zero);
		gc.setLineStyle(SWT.LINE_SOLID);
		for (int k = 0; k <= 4; k++) {
			double s = end * k / 4;
			int px = LEFT + (int) (w * k / 4.0);
			gc.drawLine(px, TOP + h, px, TOP + h + 4);
			gc.drawText(Figures.engineering(s, "s"), px - 14, TOP + h + 6, true);
		}
		Color volts = new Color(47, 93, 138), amps = new Color(200, 110, 40);
		try {
			gc.setForeground(volts);
			gc.drawText("+" + Figures.engineering(vMax, "V"), 4, TOP - 2, true);
			gc.drawText("−" + Figures.engineering(vMax, "V"), 4, TOP + h - 14, true);
			gc.setForeground(amps);
			gc.drawText("+" + Figures.engineering(iMax, "A"), LEFT + w + 6, TOP - 2, true);
			gc.drawText("−" + Figures.engineering(iMax, "A"), LEFT + w + 6, TOP + h - 14, true);
			gc.setClipping(LEFT, TOP, w + 1, h + 1);
			trace(gc, t, shown.volts(), vMax, end, volts, SWT.LINE_SOLID, w, h);
			trace(gc, t, shown.amps(), iMax, end, amps, SWT.LINE_DASH, w, h);
		} finally {
			gc.setClipping((Rectangle) null);
			volts.dispose();
			amps.dispose();
		}
	}

	private static void trace(GC gc, double[] t, double[] y, double max, double end, Color colour, int style, int w,
			int h) {
		gc.setForeground(colour);
		gc.setLineStyle(style);
		gc.setLineWidth(2);
		for (int k = 1; k < t.length; k++) {
			gc.drawLine(x(t[k - 1], end, w), y(y[k - 1], max, h), x(t[k], end, w), y(y[k], max, h));
		}
		gc.setLineWidth(1);
		gc.setLineStyle(SWT.LINE_SOLID);
	}

	private static int x(double s, double end, int w) {
		return LEFT + (int) Math.round(s / end * w);
	}

	private static int y(double v, double max, int h) {
		return TOP + h / 2 - (int) Math.round(v / max * (h / 2.0 - 2));
	}

	private void read(int mouseX) {
		if (shown == null) {
			return;
		}
		int w = canvas.getClientArea().width - LEFT - RIGHT;
		double[] t = shown.seconds();
		double at = Math.min(1, Math.max(0, (double) (mouseX - LEFT) / w)) * t[t.length - 1];
		int k = 0;
		while (k < t.length - 1 && t[k + 1] <= at) {
			k++;
		}
		readout.setText(String.format(Locale.ROOT, "at %s: %s, %s", Figures.engineering(t[k], "s"),
				Figures.engineering(shown.volts()[k], "V"), Figures.engineering(shown.amps()[k], "A")));
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
