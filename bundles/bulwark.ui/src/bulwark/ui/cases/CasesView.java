package bulwark.ui.cases;

import java.util.List;
import java.util.Locale;
import java.util.function.BiConsumer;
import java.util.function.Function;

import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Table;
import org.eclipse.ui.part.ViewPart;

import bulwark.check.cases.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.cases.PartStress;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.findings.FindingsHub;

/**
 * The cases the design was checked under — normal, the designer's, the generated abuse, surges — each with
 * whether it solved and whether every part stayed within its derated ratings, and its most stressed part.
 */
public class CasesView extends ViewPart {
	public static final String ID = "bulwark.ui.cases";

	private TableViewer viewer;
	private final BiConsumer<DesignEditor, DesignResult> listener = this::show;

	@Override
	public void createPartControl(Composite parent) {
		viewer = new TableViewer(parent, SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL | SWT.BORDER);
		Table table = viewer.getTable();
		table.setHeaderVisible(true);
		table.setLinesVisible(true);
		column("Case", 300, CaseResult::name);
		column("Kind", 80, CaseResult::kind);
		column("Result", 80, c -> !c.converged() ? "not solved" : worst(c) == null || worst(c).utilisation() <= 1 ? "pass" : "fail");
		column("Most stressed", 220, c -> {
			PartStress w = worst(c);
			return w == null ? "" : String.format(Locale.ROOT, "%s, %.0f %% (%s)", w.part(), 100 * w.utilisation(), w.limiting());
		});
		viewer.setContentProvider(ArrayContentProvider.getInstance());
		viewer.setInput(List.of());
		setContentDescription("No design checked yet.");
		FindingsHub.subscribe(listener);
	}

	/** The part with the highest utilisation in the case, or null when no part is rated. */
	static PartStress worst(CaseResult c) {
		PartStress worst = null;
		for (PartStress p : c.parts()) {
			if (p.utilisation() != null && (worst == null || p.utilisation() > worst.utilisation())) {
				worst = p;
			}
		}
		return worst;
	}

	private void column(String title, int width, Function<CaseResult, String> text) {
		TableViewerColumn c = new TableViewerColumn(viewer, SWT.LEFT);
		c.getColumn().setText(title);
		c.getColumn().setWidth(width);
		c.setLabelProvider(new ColumnLabelProvider() {
			@Override
			public String getText(Object element) {
				return text.apply((CaseResult) element);
			}
		});
	}

	private void show(DesignEditor from, DesignResult result) {
		if (viewer == null || viewer.getControl().isDisposed() || from.isClosed()) {
			return;
		}
		viewer.setInput(result.cases());
		long failing = result.cases().stream().filter(c -> !c.converged() || worst(c) != null && worst(c).utilisation() > 1)
				.count();
		setContentDescription(result.cases().size() + " case(s) under the review policy '" + result.policy() + "', "
				+ failing + " with a part over its derated rating or not solved");
	}

	/** The cases shown, for tests. */
	@SuppressWarnings("unchecked")
	public List<CaseResult> shownCases() {
		return (List<CaseResult>) viewer.getInput();
	}

	@Override
	public void setFocus() {
		viewer.getControl().setFocus();
	}

	@Override
	public void dispose() {
		FindingsHub.unsubscribe(listener);
		super.dispose();
	}
}
