package bulwark.ui.topology;

import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.function.BiConsumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.eclipse.xtext.util.CancelIndicator;

import bulwark.check.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.Finding;
import bulwark.check.PartStress;
import bulwark.check.load.LoadedDesign;
import bulwark.ui.BulwarkUi;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.findings.FindingsHub;
import bulwark.ui.stress.UtilisationScale;

/**
 * The circuit drawn automatically (TopologyLayout): terminals on the left, each part filled by its worst
 * utilisation on the stress map's scale, the parts on a reverse path outlined heavily.
 */
public class TopologyView extends ViewPart {
	public static final String ID = "bulwark.ui.topology";

	private ScrolledComposite scroller;
	private Canvas canvas;
	private TopologyLayout.Drawing drawing;
	private final Map<String, Double> worst = new HashMap<>();
	private final Set<String> onReversePath = new HashSet<>();
	private final BiConsumer<DesignEditor, DesignResult> listener = this::show;

	@Override
	public void createPartControl(Composite parent) {
		scroller = new ScrolledComposite(parent, SWT.H_SCROLL | SWT.V_SCROLL);
		canvas = new Canvas(scroller, SWT.DOUBLE_BUFFERED);
		scroller.setContent(canvas);
		canvas.addPaintListener(e -> paint(e.gc));
		setContentDescription("No design checked yet.");
		FindingsHub.subscribe(listener);
	}

	private void show(DesignEditor editor, DesignResult result) {
		if (canvas == null || canvas.isDisposed() || editor.isClosed() || editor.file() == null
				|| editor.file().toString().endsWith(".bulwark-policy")) {
			return;
		}
		String text = editor.getDocumentProvider().getDocument(editor.getEditorInput()).get();
		LoadedDesign loaded = BulwarkUi.checker().loader().load(text, editor.file().toString(), CancelIndicator.NullImpl);
		if (loaded.design() == null) {
			return;
		}
		drawing = TopologyLayout.of(loaded.design());
		worst.clear();
		for (CaseResult c : result.cases()) {
			for (PartStress p : c.parts()) {
				if (p.utilisation() != null) {
					worst.merge(p.part(), p.utilisation(), Math::max);
				}
			}
		}
		onReversePath.clear();
		for (Finding f : result.findings()) {
			if (f.rule().equals("reverse-path")) {
				int start = f.message().indexOf(": "), end = f.message().indexOf("; its ");
				if (start > 0 && end > start) {
					for (String step : f.message().substring(start + 2, end).split(" → ")) {
						onReversePath.add(step);
					}
				}
			}
		}
		canvas.setSize((int) drawing.width() + 20, (int) drawing.height() + 20);
		setContentDescription(drawing.boxes().size() + " boxes; filled by worst utilisation, heavy outline on a reverse path");
		canvas.redraw();
	}

	/** What is drawn, for tests. */
	public TopologyLayout.Drawing shownDrawing() {
		return drawing;
	}

	private void paint(GC gc) {
		if (drawing == null) {
			return;
		}
		gc.setAntialias(SWT.ON);
		Color wire = canvas.getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY);
		gc.setForeground(wire);
		for (TopologyLayout.Wire w : drawing.wires()) {
			for (int i = 1; i < w.points().size(); i++) {
				double[] a = w.points().get(i - 1), b = w.points().get(i);
				gc.drawLine((int) a[0] + 10, (int) a[1] + 10, (int) b[0] + 10, (int) b[1] + 10);
			}
		}
		for (TopologyLayout.Box b : drawing.boxes()) {
			int x = (int) b.x() + 10, y = (int) b.y() + 10, w = (int) b.width(), h = (int) b.height();
			if (b.kind().equals("net")) {
				gc.setBackground(wire);
				gc.fillOval(x + 2, y + 2, 6, 6);
				gc.drawText(b.name(), x + 10, y - 12, true);
				continue;
			}
			Double u = worst.get(b.name());
			Color fill = u == null ? null : new Color(UtilisationScale.of(u));
			gc.setBackground(fill != null ? fill : canvas.getDisplay().getSystemColor(SWT.COLOR_WHITE));
			if (b.kind().equals("terminal")) {
				gc.fillRoundRectangle(x, y, w, h, 12, 12);
				gc.drawRoundRectangle(x, y, w, h, 12, 12);
			} else {
				gc.fillRectangle(x, y, w, h);
				gc.setLineWidth(onReversePath.contains(b.name()) ? 3 : 1);
				gc.drawRectangle(x, y, w, h);
				gc.setLineWidth(1);
			}
			// text readable on the darker end of the scale
			gc.setForeground(u != null && u > 1.3 ? canvas.getDisplay().getSystemColor(SWT.COLOR_WHITE) : wire);
			gc.drawText(b.name(), x + 4, y + 2, true);
			gc.drawText(b.kind(), x + 4, y + h / 2, true);
			gc.setForeground(wire);
			if (fill != null) {
				fill.dispose();
			}
		}
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
