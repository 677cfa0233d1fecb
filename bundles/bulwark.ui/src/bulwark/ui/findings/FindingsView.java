package bulwark.ui.findings;

import java.util.List;
import java.util.function.BiConsumer;
import java.util.function.Function;

import java.time.LocalDate;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.dialogs.InputDialog;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.text.BadLocationException;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.window.Window;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.viewers.Viewer;
import org.eclipse.jface.viewers.ViewerFilter;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Label;
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

import bulwark.check.finding.Concern;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.ui.editor.DesignEditor;

/**
 * The findings of the design being edited: one row each, filtered by severity and concern; double-click
 * jumps to the text.
 */
public class FindingsView extends ViewPart {
	public static final String ID = "bulwark.ui.findings";

	private TableViewer viewer;
	private DesignEditor editor;
	private final BiConsumer<DesignEditor, DesignResult> listener = this::show;

	private String severityShown = "all", concernShown = "all";

	@Override
	public void createPartControl(Composite parent) {
		parent.setLayout(new GridLayout(1, false));
		Composite filters = new Composite(parent, SWT.NONE);
		filters.setLayout(new GridLayout(4, false));
		new Label(filters, SWT.NONE).setText("Severity:");
		Combo severity = new Combo(filters, SWT.READ_ONLY);
		severity.setItems("all", "error", "warning", "info");
		severity.select(0);
		new Label(filters, SWT.NONE).setText("Concern:");
		Combo concern = new Combo(filters, SWT.READ_ONLY);
		concern.add("all");
		for (Concern c : Concern.values()) {
			concern.add(c.id());
		}
		concern.select(0);
		severity.addListener(SWT.Selection, e -> filter(severity.getText(), concernShown));
		concern.addListener(SWT.Selection, e -> filter(severityShown, concern.getText()));
		viewer = new TableViewer(parent, SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL | SWT.BORDER);
		viewer.getControl().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
		viewer.addFilter(new ViewerFilter() {
			@Override
			public boolean select(Viewer v, Object parentElement, Object element) {
				Finding f = (Finding) element;
				return (severityShown.equals("all") || f.severity().id().equals(severityShown))
						&& (concernShown.equals("all") || f.concern().id().equals(concernShown));
			}
		});
		Table table = viewer.getTable();
		table.setHeaderVisible(true);
		table.setLinesVisible(true);
		column("Severity", 90, f -> f.severity().id() + (f.waived() ? " (waived)" : ""), this::icon);
		column("Rule", 130, f -> f.rule().text(), f -> null);
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
		MenuManager menu = new MenuManager();
		menu.add(new Action("Waive…") {
			@Override
			public void run() {
				Object o = viewer.getStructuredSelection().getFirstElement();
				if (o instanceof Finding f) {
					askAndWaive(f);
				}
			}
		});
		viewer.getControl().setMenu(menu.createContextMenu(viewer.getControl()));
		setContentDescription("No design checked yet.");
		getSite().setSelectionProvider(viewer); // the topology highlights the selected finding's reverse path
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
				+ result.status().label() + ", " + result.findings().size() + " finding(s)");
	}

	/** Asks for the justification and the name the review policy wants, then writes the waiver. */
	private void askAndWaive(Finding f) {
		if (f.part() == null || editor == null) {
			MessageDialog.openInformation(getSite().getShell(), "Waive", "Only a finding on a part can be waived.");
			return;
		}
		String title = "Waive " + f.rule() + " on " + f.part();
		var warning = WaivePrompt.farOver(f);
		if (warning.isPresent() && !MessageDialog.openConfirm(getSite().getShell(), title, warning.get())) {
			return;
		}
		InputDialog why = new InputDialog(getSite().getShell(), title, WaivePrompt.why(f), "",
				t -> t.isBlank() ? "A justification is needed" : null);
		if (why.open() != Window.OK) {
			return;
		}
		// left empty: the one who accepts a finding writes their own name, never the login's
		InputDialog who = new InputDialog(getSite().getShell(), title, "Who accepts it? (your name)", "",
				t -> t.isBlank() ? "A name is needed" : null);
		if (who.open() == Window.OK) {
			waive(f, why.getValue(), who.getValue());
		}
	}

	/** Appends a waiver of the finding to the design in the editor; what "Waive…" does after asking. */
	public void waive(Finding f, String justification, String who) {
		IDocument doc = editor.getDocumentProvider().getDocument(editor.getEditorInput());
		try {
			doc.replace(doc.getLength(), 0, WaiverText.of(f, justification, who, LocalDate.now()));
		} catch (BadLocationException e) {
			throw new IllegalStateException(e);
		}
	}

	/** Shows only the findings of a severity and a concern ("all" for any); the filter the view's combos set. */
	public void filter(String severity, String concern) {
		severityShown = severity;
		concernShown = concern;
		viewer.refresh();
	}

	/** The findings the filter lets through, for tests. */
	public List<Finding> visibleFindings() {
		return shownFindings().stream().filter(f -> (severityShown.equals("all") || f.severity().id().equals(severityShown))
				&& (concernShown.equals("all") || f.concern().id().equals(concernShown))).toList();
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
