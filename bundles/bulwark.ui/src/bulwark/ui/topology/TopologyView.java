package bulwark.ui.topology;

import java.io.IOException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.function.BiConsumer;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.eclipse.xtext.util.CancelIndicator;

import bulwark.check.cases.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.cases.PartStress;
import bulwark.check.io.AtomicFile;
import bulwark.check.load.LoadedDesign;
import bulwark.check.rules.ReversePathRule;
import bulwark.ui.BulwarkUi;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.findings.FindingsHub;
import bulwark.ui.findings.FindingsView;
import bulwark.ui.stress.UtilisationScale;

/**
 * The circuit drawn automatically (TopologyLayout): terminals on the left, each part filled by its worst
 * utilisation on the stress map's scale, the parts on a reverse path outlined heavily; selecting a reverse-path
 * finding draws its path in the highlight colour. Export SVG… writes the same picture (TopologySvg).
 */
public class TopologyView extends ViewPart {
	public static final String ID = "bulwark.ui.topology";

	private ScrolledComposite scroller;
	private Canvas canvas;
	private TopologyLayout.Drawing drawing;
	private final Map<String, Double> worst = new HashMap<>();
	private final Set<String> onReversePath = new HashSet<>();
	private Set<String> highlighted = Set.of();
	private final BiConsumer<DesignEditor, DesignResult> listener = this::show;
	private final ISelectionListener findingSelected = (part, selection) -> {
		if (selection instanceof IStructuredSelection s && s.getFirstElement() instanceof Finding f) {
			highlight(f);
		}
	};

	@Override
	public void createPartControl(Composite parent) {
		scroller = new ScrolledComposite(parent, SWT.H_SCROLL | SWT.V_SCROLL);
		canvas = new Canvas(scroller, SWT.DOUBLE_BUFFERED);
		scroller.setContent(canvas);
		canvas.addPaintListener(e -> paint(e.gc));
		setContentDescription("No design checked yet.");
		FindingsHub.subscribe(listener);
		getSite().getPage().addSelectionListener(FindingsView.ID, findingSelected);
		getViewSite().getActionBars().getToolBarManager().add(new Action("Export SVG\u2026") {
			@Override
			public void run() {
				exportAsked();
			}
		});
	}

	/** Highlights the reverse path a finding names (a finding of another rule clears the highlight). */
	public void highlight(Finding f) {
		List<String> path = ReversePathRule.pathOf(f);
		highlighted = drawing == null ? Set.of() : pathWithTerminalNets(drawing, path);
		if (!canvas.isDisposed()) {
			canvas.redraw();
			canvas.update();
		}
	}

	/** The path's steps, plus the net each of its terminals stands on (the path names terminals, not their nets). */
	static Set<String> pathWithTerminalNets(TopologyLayout.Drawing d, List<String> path) {
		Set<String> steps = new HashSet<>(path);
		for (TopologyLayout.Box b : d.boxes()) {
			if (b.kind().equals("terminal") && steps.contains(b.name())) {
				d.wires().stream().filter(w -> w.part().equals(b.name())).forEach(w -> steps.add("net " + w.net()));
			}
		}
		return steps;
	}

	/** What is highlighted, for tests. */
	public Set<String> highlighted() {
		return highlighted;
	}

	/** The picture as SVG: what Export SVG… writes. */
	public String svg() {
		return drawing == null ? null : TopologySvg.of(drawing, worst, onReversePath, highlighted);
	}

	private void exportAsked() {
		String svg = svg();
		if (svg == null) {
			return;
		}
		FileDialog dialog = new FileDialog(getSite().getShell(), SWT.SAVE);
		dialog.setText("Export the topology as SVG");
		dialog.setFilterExtensions(new String[] { "*.svg" });
		dialog.setFileName("topology.svg");
		dialog.setOverwrite(true);
		String file = dialog.open();
		if (file == null) {
			return;
		}
		try {
			AtomicFile.write(Path.of(file), svg, false);
		} catch (IOException e) {
			MessageDialog.openError(getSite().getShell(), "Topology not exported", "Could not write " + file + ": " + e.getMessage());
		}
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
			onReversePath.addAll(ReversePathRule.pathOf(f));
		}
		highlighted = Set.of();
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
		Color path = new Color(TopologySvg.HIGHLIGHT);
		for (TopologyLayout.Wire w : drawing.wires()) {
			boolean on = TopologySvg.onPath(highlighted, w);
			gc.setForeground(on ? path : wire);
			gc.setLineWidth(on ? 3 : 1);
			for (int i = 1; i < w.points().size(); i++) {
				double[] a = w.points().get(i - 1), b = w.points().get(i);
				gc.drawLine((int) a[0] + 10, (int) a[1] + 10, (int) b[0] + 10, (int) b[1] + 10);
			}
		}
		gc.setLineWidth(1);
		gc.setForeground(wire);
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
				boolean on = highlighted.contains(b.name());
				gc.fillRoundRectangle(x, y, w, h, 12, 12);
				gc.setForeground(on ? path : wire);
				gc.setLineWidth(on ? 3 : 1);
				gc.drawRoundRectangle(x, y, w, h, 12, 12);
				gc.setLineWidth(1);
			} else {
				gc.fillRectangle(x, y, w, h);
				boolean on = highlighted.contains(b.name());
				gc.setForeground(on ? path : wire);
				gc.setLineWidth(on || onReversePath.contains(b.name()) ? 3 : 1);
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
		path.dispose();
	}

	@Override
	public void setFocus() {
		canvas.setFocus();
	}

	@Override
	public void dispose() {
		FindingsHub.unsubscribe(listener);
		getSite().getPage().removeSelectionListener(FindingsView.ID, findingSelected);
		super.dispose();
	}
}
