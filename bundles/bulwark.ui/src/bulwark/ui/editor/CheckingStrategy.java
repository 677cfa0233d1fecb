package bulwark.ui.editor;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.IRegion;
import org.eclipse.jface.text.Position;
import org.eclipse.jface.text.reconciler.DirtyRegion;
import org.eclipse.jface.text.reconciler.IReconcilingStrategy;
import org.eclipse.jface.text.reconciler.IReconcilingStrategyExtension;
import org.eclipse.jface.text.source.Annotation;
import org.eclipse.jface.text.source.IAnnotationModel;
import org.eclipse.jface.text.source.IAnnotationModelExtension;
import org.eclipse.jface.text.source.ISourceViewer;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IURIEditorInput;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.lang.ide.highlight.SemanticRanges;
import bulwark.ui.BulwarkUi;
import bulwark.ui.findings.FindingsHub;

/**
 * Runs on the reconciler's background thread: checks the whole document and replaces the finding
 * annotations. A result is dropped if the document changed while it was computed, so stale findings never
 * replace newer ones.
 */
final class CheckingStrategy implements IReconcilingStrategy, IReconcilingStrategyExtension {
	private final DesignEditor editor;
	private final ISourceViewer viewer;
	private IDocument document;
	private IProgressMonitor monitor;
	private Annotation[] shown = new Annotation[0];
	/** One low-priority thread classifies names for every editor; only the newest text of each is parsed. */
	private static final java.util.concurrent.ExecutorService SEMANTIC = java.util.concurrent.Executors
			.newSingleThreadExecutor(r -> {
				Thread t = new Thread(r, "bulwark semantic highlighting");
				t.setDaemon(true);
				t.setPriority(Thread.MIN_PRIORITY);
				return t;
			});
	private volatile long semanticGeneration;

	CheckingStrategy(DesignEditor editor, ISourceViewer viewer) {
		this.editor = editor;
		this.viewer = viewer;
	}

	@Override
	public void setDocument(IDocument document) {
		this.document = document;
	}

	@Override
	public void setProgressMonitor(IProgressMonitor monitor) {
		this.monitor = monitor;
	}

	@Override
	public void initialReconcile() {
		check();
	}

	@Override
	public void reconcile(DirtyRegion dirtyRegion, IRegion subRegion) {
		check();
	}

	@Override
	public void reconcile(IRegion partition) {
		check();
	}

	private void check() {
		IDocument doc = document;
		if (doc == null) {
			return;
		}
		String text = doc.get();
		// a review policy is validated, not solved
		DesignResult result = fileName().endsWith(".bulwark-policy") ? BulwarkUi.checker().checkPolicy(text, fileName())
				: BulwarkUi.checker().check(text, fileName(), () -> monitor != null && monitor.isCanceled());
		if (editor.isClosed() || !text.equals(doc.get())) {
			return; // closed, or the engineer typed on and the next reconcile brings the newer result
		}
		Map<Annotation, Position> added = new HashMap<>();
		for (Finding f : result.findings()) {
			int offset = Math.max(0, Math.min(f.location().offset(), text.length()));
			int length = Math.max(0, Math.min(f.location().length(), text.length() - offset));
			added.put(new FindingAnnotation(f), new Position(offset, length));
		}
		IAnnotationModel model = viewer.getAnnotationModel();
		if (model != null) {
			synchronized (this) {
				if (model instanceof IAnnotationModelExtension ext) {
					ext.replaceAnnotations(shown, added);
				} else {
					for (Annotation a : shown) {
						model.removeAnnotation(a);
					}
					added.forEach(model::addAnnotation);
				}
				shown = added.keySet().toArray(new Annotation[0]);
			}
		}
		editor.resultArrived(result);
		Display display = Display.getDefault();
		if (!display.isDisposed()) {
			display.asyncExec(() -> {
				if (!editor.isClosed()) {
					FindingsHub.publish(editor, result);
				}
			});
		}
		// the names classified for highlighting, on a thread of their own so that the next check never waits
		if (!fileName().endsWith(".bulwark-policy")) {
			long generation = ++semanticGeneration;
			String file = fileName();
			SEMANTIC.execute(() -> {
				if (generation != semanticGeneration || editor.isClosed()) {
					return; // a newer text is on its way
				}
				List<SemanticRanges.Range> ranges = SemanticRanges.of(BulwarkUi.checker().loader().injector(), text, file);
				if (!display.isDisposed()) {
					display.asyncExec(() -> editor.semanticRangesArrived(text, ranges));
				}
			});
		}
	}

	private String fileName() {
		IEditorInput input = editor.getEditorInput();
		if (input instanceof IURIEditorInput u && u.getURI() != null) {
			return u.getURI().getPath();
		}
		return input == null ? "untitled.bulwark" : input.getName();
	}
}
