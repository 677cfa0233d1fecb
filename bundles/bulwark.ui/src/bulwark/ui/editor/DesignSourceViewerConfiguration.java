package bulwark.ui.editor;

import org.eclipse.jface.preference.IPreferenceStore;
import org.eclipse.jface.text.ITextHover;
import org.eclipse.jface.text.reconciler.IReconciler;
import org.eclipse.jface.text.reconciler.MonoReconciler;
import org.eclipse.jface.text.source.ISourceViewer;
import org.eclipse.ui.editors.text.TextSourceViewerConfiguration;

/** Installs the background check. */
class DesignSourceViewerConfiguration extends TextSourceViewerConfiguration {
	/** Pause after the last keystroke before a check starts. */
	static final int DEBOUNCE_MS = 150;

	private final DesignEditor editor;

	DesignSourceViewerConfiguration(DesignEditor editor, IPreferenceStore store) {
		super(store);
		this.editor = editor;
	}

	@Override
	public ITextHover getTextHover(ISourceViewer sourceViewer, String contentType) {
		return new PartHover(editor);
	}

	@Override
	public IReconciler getReconciler(ISourceViewer sourceViewer) {
		MonoReconciler reconciler = new MonoReconciler(new CheckingStrategy(editor, sourceViewer), false);
		reconciler.setDelay(DEBOUNCE_MS);
		return reconciler;
	}
}
