package bulwark.ui.findings;

import java.util.List;
import java.util.function.BiConsumer;
import java.util.function.Function;

import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Table;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IPartListener2;
import org.eclipse.ui.ISharedImages;
import org.eclipse.ui.IWorkbenchPartReference;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.part.ViewPart;

import bulwark.check.DesignResult;
import bulwark.check.Finding;
import bulwark.ui.editor.DesignEditor;

/** The findings of the design being edited: one row each; double-click jumps to the text. */
public class FindingsView extends ViewPart {
	public static final String ID = "bulwark.ui.findings";

	private TableViewer viewer;
	private DesignEditor editor;
	private final BiConsumer<DesignEditor, DesignResult> listener = this::show;

	@Override
	public void createPartControl(Composite parent) {
		viewer = new TableViewer(parent, SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL | SWT.BORDER);
		Table table = viewer.getTable();
		table.setHeaderVisible(true);
		table.setLinesVisible(true);
		column("Severity", 90, f -> f.severity().id() + (f.waived() ? " (waived)" : ""), this::icon);
		column("Rule", 130, Finding::rule, f -> null);
		column("Concern", 110, f -> f.concern().id(), f -> null);
		column("Part", 80, f -> f.part() == null ? "" : f.part(), f -> null);
		column("Case", 170, f -> f.caseName() == null ? "" : f.caseName(), f -> null);
		column("Line", 50, f -> f.location().line() == 0 ? "" : Integer.toString(f.location().line()), f -> null);
		column("Message", 600, Finding::message, f -> null);
		viewer.setContentProvider(ArrayContentProvider.getInstance());
		viewer.setInput(List.of());
		viewer.addDoubleClickListener(e -> {
			Object o = ((IStructuredSelection) e.getSelection()).getFirstElement();
			if (o instanceof Finding f && editor != null) {
				editor.getSite().getPage().activate(editor);
				editor.selectAndReveal(f.location().offset(), f.location().length());
			}
		});
		setContentDescription("No design checked yet.");
		FindingsHub.subscribe(listener);
		getSite().getPage().addPartListener(activation);
	}

	/** Shows the findings of whichever design editor the engineer turns to. */
	private final IPartListener2 activation = new IPartListener2() {
		@Override
		public void partActivated(IWorkbenchPartReference ref) {
			if (ref.getPart(false) instanceof DesignEditor e && e.lastResult() != null) {
				show(e, e.lastResult());
			}
		}
	};

	private void column(String title, int width, Function<Finding, String> text, Function<Finding, Image> image) {
		TableViewerColumn c = new TableViewerColumn(viewer, SWT.LEFT);
		c.getColumn().setText(title);
		c.getColumn().setWidth(width);
		c.setLabelProvider(new ColumnLabelProvider() {
			@Override
			public String getText(Object element) {
				return text.apply((Finding) element);
			}

			@Override
			public Image getImage(Object element) {
				return image.apply((Finding) element);
			}
		});
	}

	private Image icon(Finding f) {
		ISharedImages images = PlatformUI.getWorkbench().getSharedImages();
		switch (f.severity()) {
		case ERROR:
			return images.getImage(ISharedImages.IMG_OBJS_ERROR_TSK);
		case WARNING:
			return images.getImage(ISharedImages.IMG_OBJS_WARN_TSK);
		default:
			return images.getImage(ISharedImages.IMG_OBJS_INFO_TSK);
		}
	}

	private void show(DesignEditor from, DesignResult result) {
		if (viewer == null || viewer.getControl().isDisposed() || from.isClosed()) {
			return;
		}
		IEditorPart active = getSite().getPage().getActiveEditor();
		if (active instanceof DesignEditor && active != from) {
			return; // a background check of another open design; its results show when it is activated
		}
		editor = from;
		viewer.setInput(result.findings());
		setContentDescription((result.title() == null ? result.file() : result.title()) + ": "
				+ result.status().id() + ", " + result.findings().size() + " finding(s)");
	}

	/** The findings now listed, for tests. */
	@SuppressWarnings("unchecked")
	public List<Finding> shownFindings() {
		return (List<Finding>) viewer.getInput();
	}

	@Override
	public void setFocus() {
		viewer.getControl().setFocus();
	}

	@Override
	public void dispose() {
		FindingsHub.unsubscribe(listener);
		getSite().getPage().removePartListener(activation);
		super.dispose();
	}
}
