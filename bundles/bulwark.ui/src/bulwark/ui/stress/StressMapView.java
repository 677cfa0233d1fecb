package bulwark.ui.stress;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.BiConsumer;

import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.viewers.Viewer;
import org.eclipse.jface.viewers.ViewerComparator;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.ui.part.ViewPart;

import bulwark.check.cases.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.cases.PartStress;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.findings.FindingsHub;

/**
 * Parts × cases, each cell the part's utilisation of its derated rating in that case, coloured on Bulwark's
 * own continuous scale (UtilisationScale); the worst column sorts, and selecting a row selects the part's
 * declaration in the editor.
 */
public class StressMapView extends ViewPart {
	public static final String ID = "bulwark.ui.stressMap";

	/** One part's row: its utilisation per case (null where it has no rating) and its worst. */
	public record Row(String part, List<Double> perCase, double worst, String worstCase) {
	}

	private Composite parent;
	private TableViewer viewer;
	private DesignEditor editor;
	private List<Row> rows = List.of();
	private final Map<RGB, Color> colours = new HashMap<>();
	private final BiConsumer<DesignEditor, DesignResult> listener = this::show;
	private boolean byWorst = true;

	@Override
	public void createPartControl(Composite parent) {
		this.parent = parent;
		setContentDescription("No design checked yet.");
		FindingsHub.subscribe(listener);
	}

	private void show(DesignEditor from, DesignResult result) {
		if (parent == null || parent.isDisposed() || from.isClosed()) {
			return;
		}
		editor = from;
		rows = rows(result);
		if (viewer != null) {
			viewer.getControl().dispose();
		}
		viewer = new TableViewer(parent, SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL | SWT.BORDER);
		Table table = viewer.getTable();
		table.setHeaderVisible(true);
		table.setLinesVisible(true);
		column("Part", 90, r -> r.part(), r -> null);
		TableViewerColumn worst = column("Worst", 70, r -> percent(r.worst()), r -> r.worst());
		worst.getColumn().addListener(SWT.Selection, e -> {
			byWorst = !byWorst;
			viewer.refresh();
		});
		for (int i = 0; i < result.cases().size(); i++) {
			int k = i;
			TableViewerColumn c = column(result.cases().get(i).name(), 110,
					r -> r.perCase().get(k) == null ? "" : percent(r.perCase().get(k)), r -> r.perCase().get(k));
			c.getColumn().setToolTipText(result.cases().get(i).name());
		}
		viewer.setContentProvider(ArrayContentProvider.getInstance());
		viewer.setComparator(new ViewerComparator() {
			@Override
			public int compare(Viewer v, Object a, Object b) {
				return byWorst ? Double.compare(((Row) b).worst(), ((Row) a).worst()) : ((Row) a).part().compareTo(((Row) b).part());
			}
		});
		viewer.setInput(rows);
		viewer.addSelectionChangedListener(e -> {
			Object o = ((IStructuredSelection) e.getSelection()).getFirstElement();
			if (o instanceof Row r) {
				reveal(r.part());
			}
		});
		parent.layout(true, true);
		setContentDescription((result.title() == null ? result.file() : result.title()) + ": " + rows.size()
				+ " rated part(s) × " + result.cases().size() + " case(s), in % of the derated rating");
	}

	static List<Row> rows(DesignResult result) {
		Map<String, List<Double>> byPart = new LinkedHashMap<>();
		for (int i = 0; i < result.cases().size(); i++) {
			CaseResult c = result.cases().get(i);
			for (PartStress p : c.parts()) {
				List<Double> list = byPart.computeIfAbsent(p.part(), k -> new ArrayList<>());
				while (list.size() < i) {
					list.add(null);
				}
				list.add(p.utilisation());
			}
		}
		List<Row> rows = new ArrayList<>();
		byPart.forEach((part, values) -> {
			double worst = -1;
			String at = null;
			for (int i = 0; i < values.size(); i++) {
				if (values.get(i) != null && values.get(i) > worst) {
					worst = values.get(i);
					at = result.cases().get(i).name();
				}
			}
			if (at != null) {
				while (values.size() < result.cases().size()) {
					values.add(null);
				}
				rows.add(new Row(part, values, worst, at));
			}
		});
		return rows;
	}

	private TableViewerColumn column(String title, int width, java.util.function.Function<Row, String> text,
			java.util.function.Function<Row, Double> shade) {
		TableViewerColumn c = new TableViewerColumn(viewer, SWT.RIGHT);
		TableColumn column = c.getColumn();
		column.setText(title);
		column.setWidth(width);
		c.setLabelProvider(new ColumnLabelProvider() {
			@Override
			public String getText(Object element) {
				return text.apply((Row) element);
			}

			@Override
			public Color getBackground(Object element) {
				Double u = shade.apply((Row) element);
				return u == null ? null : colours.computeIfAbsent(UtilisationScale.of(u), rgb -> new Color(rgb));
			}

			@Override
			public Color getForeground(Object element) {
				Double u = shade.apply((Row) element);
				return u != null && u > 1.3 ? parent.getDisplay().getSystemColor(SWT.COLOR_WHITE) : null;
			}
		});
		return c;
	}

	/** Selects the part's designator in the editor. */
	private void reveal(String part) {
		if (editor == null || editor.isClosed()) {
			return;
		}
		IDocument doc = editor.getDocumentProvider().getDocument(editor.getEditorInput());
		java.util.regex.Matcher m = java.util.regex.Pattern.compile("\\b" + java.util.regex.Pattern.quote(part) + "\\s*\\(")
				.matcher(doc.get());
		if (m.find()) {
			editor.selectAndReveal(m.start(), part.length());
		}
	}

	private static String percent(double u) {
		return String.format(Locale.ROOT, "%.0f %%", 100 * u);
	}

	/** The rows now shown, for tests. */
	public List<Row> shownRows() {
		return rows;
	}

	@Override
	public void setFocus() {
		if (viewer != null) {
			viewer.getControl().setFocus();
		}
	}

	@Override
	public void dispose() {
		FindingsHub.unsubscribe(listener);
		colours.values().forEach(Color::dispose);
		super.dispose();
	}
}
