package bulwark.ui.changes;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.BiConsumer;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.eclipse.xtext.util.CancelIndicator;

import bulwark.check.DesignResult;
import bulwark.check.compare.Revisions;
import bulwark.check.io.AtomicFile;
import bulwark.ui.BulwarkUi;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.findings.FindingsHub;

/**
 * What changed since the previous saved version (the NAME.bak a save keeps): findings new and fixed, parts
 * worse and better — the same comparison as `bulwark compare`, for review before handing a revision on.
 * File > Compare Two Designs… shows the same for any two files.
 */
public class ChangesView extends ViewPart {
	public static final String ID = "bulwark.ui.changes";

	private TableViewer viewer;
	private final BiConsumer<DesignEditor, DesignResult> listener = this::show;

	@Override
	public void createPartControl(Composite parent) {
		viewer = new TableViewer(parent, SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.BORDER);
		viewer.getTable().setHeaderVisible(true);
		column("Change", 70, Revisions.Change::kind);
		column("What", 700, Revisions.Change::text);
		viewer.setContentProvider(ArrayContentProvider.getInstance());
		viewer.setInput(List.of());
		setContentDescription("No previous version: save a design to compare with what it was.");
		FindingsHub.subscribe(listener);
		follow.setEnabled(false);
		getViewSite().getActionBars().getToolBarManager().add(follow);
	}

	private boolean pinned;
	private final Action follow = new Action("Follow the editor") {
		@Override
		public void run() {
			pinned = false;
			setEnabled(false);
			viewer.setInput(List.of());
			setContentDescription("Comparing the design being edited with its previous saved version at its next check.");
		}
	};

	private void column(String title, int width, java.util.function.Function<Revisions.Change, String> text) {
		TableViewerColumn c = new TableViewerColumn(viewer, SWT.LEFT);
		c.getColumn().setText(title);
		c.getColumn().setWidth(width);
		c.setLabelProvider(new ColumnLabelProvider() {
			@Override
			public String getText(Object element) {
				return text.apply((Revisions.Change) element);
			}
		});
	}

	/**
	 * Compares two design files — revisions, or two designs — each checked at its own place, and keeps showing
	 * that comparison until "Follow the editor" is chosen again.
	 */
	public List<Revisions.Change> compareFiles(Path before, Path after) throws java.io.IOException {
		DesignResult a = BulwarkUi.checker().check(Files.readString(before), before.toString(), CancelIndicator.NullImpl);
		DesignResult b = BulwarkUi.checker().check(Files.readString(after), after.toString(), CancelIndicator.NullImpl);
		List<Revisions.Change> changes = Revisions.compare(a, b);
		pinned = true;
		follow.setEnabled(true);
		viewer.setInput(changes);
		setContentDescription(changes.size() + " change(s) from " + before.getFileName() + " to " + after.getFileName());
		return changes;
	}

	private void show(DesignEditor editor, DesignResult now) {
		if (pinned || viewer == null || viewer.getControl().isDisposed() || editor.isClosed() || editor.file() == null) {
			return;
		}
		Path previous = editor.file().resolveSibling(editor.file().getFileName() + AtomicFile.BACKUP_SUFFIX);
		if (!Files.isRegularFile(previous)) {
			viewer.setInput(List.of());
			setContentDescription("No previous version of " + editor.file().getFileName() + " yet: it is kept at each save.");
			return;
		}
		try {
			// checked as if it were the design itself, so that its policy and libraries resolve the same way
			DesignResult before = BulwarkUi.checker().check(Files.readString(previous), editor.file().toString(),
					CancelIndicator.NullImpl);
			List<Revisions.Change> changes = Revisions.compare(before, now);
			viewer.setInput(changes);
			setContentDescription(changes.size() + " change(s) since the previous saved version");
		} catch (java.io.IOException e) {
			setContentDescription("Cannot read " + previous + ": " + e.getMessage());
		}
	}

	/** The changes shown, for tests. */
	@SuppressWarnings("unchecked")
	public List<Revisions.Change> shownChanges() {
		return (List<Revisions.Change>) viewer.getInput();
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
