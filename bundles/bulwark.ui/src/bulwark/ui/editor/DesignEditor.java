package bulwark.ui.editor;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.ResourceBundle;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.text.DocumentEvent;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.IDocumentListener;
import org.eclipse.jface.text.Position;
import org.eclipse.jface.text.source.ISourceViewer;
import org.eclipse.jface.text.source.IVerticalRuler;
import org.eclipse.jface.text.source.projection.ProjectionAnnotation;
import org.eclipse.jface.text.source.projection.ProjectionAnnotationModel;
import org.eclipse.jface.text.source.projection.ProjectionSupport;
import org.eclipse.jface.text.source.projection.ProjectionViewer;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.jface.text.source.Annotation;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.text.source.IAnnotationModel;
import org.eclipse.jface.text.source.DefaultCharacterPairMatcher;
import org.eclipse.ui.editors.text.TextEditor;
import org.eclipse.ui.texteditor.ContentAssistAction;
import org.eclipse.ui.texteditor.ITextEditorActionDefinitionIds;
import org.eclipse.ui.texteditor.SourceViewerDecorationSupport;
import org.eclipse.ui.views.contentoutline.IContentOutlinePage;
import org.eclipse.ui.ide.FileStoreEditorInput;

import bulwark.check.DesignResult;
import bulwark.check.io.AtomicFile;
import bulwark.lang.ide.highlight.SemanticRanges;
import bulwark.ui.outline.DesignOutline;

/**
 * The design editor: a text editor whose reconciler checks the design in the background after each pause
 * in typing and shows the findings as annotations (squiggles, ruler and overview marks).
 */
public class DesignEditor extends TextEditor {
	public static final String ID = "bulwark.ui.designEditor";

	private volatile DesignResult lastResult;
	private final FixProposals fixProposals = new FixProposals(this);
	private volatile boolean closed;

	public DesignEditor() {
		setSourceViewerConfiguration(new DesignSourceViewerConfiguration(this, getPreferenceStore()));
	}

	void resultArrived(DesignResult result) {
		lastResult = result;
		DesignOutline o = outline;
		if (o != null && getSite() != null) {
			getSite().getShell().getDisplay().asyncExec(o::refresh);
		}
	}

	private volatile DesignOutline outline;

	/** The outline page, and nothing else of our own, adapted. */
	@Override
	public <T> T getAdapter(Class<T> adapter) {
		if (adapter == IContentOutlinePage.class) {
			if (outline == null) {
				outline = new DesignOutline(this);
			}
			return adapter.cast(outline);
		}
		return super.getAdapter(adapter);
	}

	private ProjectionSupport projectionSupport;
	private final SemanticHighlighter semantic = new SemanticHighlighter();
	private boolean foldingQueued;

	/** A projection viewer, so that blocks and comment runs fold (FoldRegions). */
	@Override
	protected ISourceViewer createSourceViewer(Composite parent, IVerticalRuler ruler, int styles) {
		ISourceViewer viewer = new ProjectionViewer(parent, ruler, getOverviewRuler(), isOverviewRulerVisible(), styles);
		getSourceViewerDecorationSupport(viewer); // created and configured before the viewer is used
		return viewer;
	}

	@Override
	public void createPartControl(Composite parent) {
		super.createPartControl(parent);
		ProjectionViewer viewer = (ProjectionViewer) getSourceViewer();
		projectionSupport = new ProjectionSupport(viewer, getAnnotationAccess(), getSharedColors());
		projectionSupport.install();
		viewer.doOperation(ProjectionViewer.TOGGLE);
		viewer.addTextPresentationListener(semantic);
		updateFolding();
		viewer.getDocument().addDocumentListener(new IDocumentListener() {
			@Override
			public void documentAboutToBeChanged(DocumentEvent event) {
				semantic.edited(event.getOffset(), event.getLength(), event.getText() == null ? 0 : event.getText().length());
			}

			@Override
			public void documentChanged(DocumentEvent event) {
				// once per pause in typing: the scan is cheap, redrawing the ruler on each key is not
				if (!foldingQueued) {
					foldingQueued = true;
					parent.getDisplay().timerExec(300, () -> {
						foldingQueued = false;
						updateFolding();
					});
				}
			}
		});
	}

	/**
	 * Brings the fold regions up to date with the text. A region that is still where it was keeps its
	 * annotation, and so stays folded if the engineer folded it.
	 */
	public void updateFolding() {
		ProjectionViewer viewer = (ProjectionViewer) getSourceViewer();
		if (viewer == null || viewer.getDocument() == null || viewer.getProjectionAnnotationModel() == null) {
			return;
		}
		ProjectionAnnotationModel model = viewer.getProjectionAnnotationModel();
		List<Position> wanted = new ArrayList<>(FoldRegions.of(viewer.getDocument().get()));
		List<Annotation> stale = new ArrayList<>();
		for (Iterator<Annotation> it = model.getAnnotationIterator(); it.hasNext();) {
			Annotation a = it.next();
			Position p = model.getPosition(a);
			if (!wanted.remove(p)) {
				stale.add(a);
			}
		}
		Map<ProjectionAnnotation, Position> added = new HashMap<>();
		for (Position p : wanted) {
			added.put(new ProjectionAnnotation(), p);
		}
		model.modifyAnnotations(stale.toArray(Annotation[]::new), added, null);
	}

	/** Names classified by the background parse of this text; shown if the text is still the editor's. */
	void semanticRangesArrived(String text, List<SemanticRanges.Range> ranges) {
		ISourceViewer viewer = getSourceViewer();
		if (isClosed() || viewer == null || viewer.getDocument() == null || !text.equals(viewer.getDocument().get())) {
			return;
		}
		semantic.set(ranges);
		viewer.invalidateTextPresentation();
	}

	/** The names highlighted by what they stand for, for tests. */
	public List<SemanticRanges.Range> semanticRanges() {
		return semantic.ranges();
	}

	/** The fold regions now in the editor, for tests. */
	public List<Position> foldRegions() {
		List<Position> regions = new ArrayList<>();
		ProjectionViewer viewer = (ProjectionViewer) getSourceViewer();
		ProjectionAnnotationModel model = viewer == null ? null : viewer.getProjectionAnnotationModel();
		if (model != null) {
			for (Iterator<Annotation> it = model.getAnnotationIterator(); it.hasNext();) {
				regions.add(model.getPosition(it.next()));
			}
		}
		regions.sort((a, b) -> Integer.compare(a.getOffset(), b.getOffset()));
		return regions;
	}

	/** Ctrl+Space opens the proposals (TextEditor registers Ctrl+1 itself, content assist it leaves to us). */
	@Override
	protected void createActions() {
		super.createActions();
		ContentAssistAction assist = new ContentAssistAction(
				ResourceBundle.getBundle("bulwark.ui.editor.EditorActions"), "ContentAssistProposal.", this);
		assist.setActionDefinitionId(ITextEditorActionDefinitionIds.CONTENT_ASSIST_PROPOSALS);
		setAction("ContentAssistProposal", assist);
	}

	/** Brackets of a part's pins and settings are matched under the caret. */
	@Override
	protected void configureSourceViewerDecorationSupport(SourceViewerDecorationSupport support) {
		support.setCharacterPairMatcher(new DefaultCharacterPairMatcher(new char[] { '(', ')', '{', '}' }));
		support.setMatchingCharacterPainterPreferenceKeys(MATCHING_BRACKETS, MATCHING_BRACKETS_COLOR);
		getPreferenceStore().setDefault(MATCHING_BRACKETS, true);
		getPreferenceStore().setDefault(MATCHING_BRACKETS_COLOR, "128,128,128");
		super.configureSourceViewerDecorationSupport(support);
	}

	static final String MATCHING_BRACKETS = "bulwark.matchingBrackets";
	static final String MATCHING_BRACKETS_COLOR = "bulwark.matchingBracketsColor";

	/** True once the editor is closed: a check still running for it must not publish anything. */
	public boolean isClosed() {
		return closed;
	}

	@Override
	public void dispose() {
		closed = true;
		super.dispose();
	}

	/**
	 * Saves atomically, keeping the previous version as NAME.bak: the text goes to a temporary file beside the
	 * design and replaces it in one step, so a crash midway leaves the design as it was. A save that fails
	 * leaves the editor dirty and says why; nothing typed is lost.
	 */
	@Override
	public void doSave(IProgressMonitor monitor) {
		Path file = file();
		if (file == null) {
			super.doSave(monitor);
			return;
		}
		IDocument document = getDocumentProvider().getDocument(getEditorInput());
		try {
			AtomicFile.write(file, document.get(), true);
		} catch (IOException e) {
			MessageDialog.openError(getSite().getShell(), "Design not saved",
					"Could not save " + file + ": " + e.getMessage() + "\nThe text is still here, unsaved.");
			return;
		}
		// the file now holds the text: let the provider reread it, so that the editor is clean, and keep the view
		ISelection selection = getSelectionProvider().getSelection();
		int top = getSourceViewer() == null ? 0 : getSourceViewer().getTopIndex();
		try {
			getDocumentProvider().resetDocument(getEditorInput());
		} catch (CoreException e) {
			MessageDialog.openError(getSite().getShell(), "Design saved, not reread", e.getMessage());
		}
		getSelectionProvider().setSelection(selection);
		if (getSourceViewer() != null) {
			getSourceViewer().setTopIndex(top);
		}
	}

	/** The design's file on disk, or null when the input is not a local file. */
	public Path file() {
		if (getEditorInput() instanceof FileStoreEditorInput input && "file".equals(input.getURI().getScheme())) {
			return Path.of(input.getURI());
		}
		return null;
	}

	/** The quick fixes of this editor (what Ctrl+1 shows). */
	public FixProposals fixProposals() {
		return fixProposals;
	}

	/** The newest check result, or null before the first check finished. */
	public DesignResult lastResult() {
		return lastResult;
	}

	/** What hovering over a name shows (null when it is not a part of the last check). */
	public String hoverText(String name) {
		DesignResult result = lastResult;
		return result == null ? null : PartHover.describe(result, name);
	}

	/** Finding annotations now in the editor. */
	public List<FindingAnnotation> findingAnnotations() {
		List<FindingAnnotation> result = new ArrayList<>();
		IAnnotationModel model = getSourceViewer() == null ? null : getSourceViewer().getAnnotationModel();
		if (model == null) {
			return result;
		}
		for (Iterator<Annotation> it = model.getAnnotationIterator(); it.hasNext();) {
			if (it.next() instanceof FindingAnnotation a) {
				result.add(a);
			}
		}
		return result;
	}

	/** 0-based line of an annotation, -1 when unknown. */
	public int lineOf(Annotation a) {
		try {
			var pos = getSourceViewer().getAnnotationModel().getPosition(a);
			return pos == null ? -1 : getSourceViewer().getDocument().getLineOfOffset(pos.getOffset());
		} catch (Exception e) {
			return -1;
		}
	}
}
