package bulwark.ui.editor;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

import org.eclipse.jface.text.source.Annotation;
import org.eclipse.jface.text.source.IAnnotationModel;
import org.eclipse.ui.editors.text.TextEditor;

import bulwark.check.DesignResult;

/**
 * The design editor: a text editor whose reconciler checks the design in the background after each pause
 * in typing and shows the findings as annotations (squiggles, ruler and overview marks).
 */
public class DesignEditor extends TextEditor {
	public static final String ID = "bulwark.ui.designEditor";

	private volatile DesignResult lastResult;
	private volatile boolean closed;

	public DesignEditor() {
		setSourceViewerConfiguration(new DesignSourceViewerConfiguration(this, getPreferenceStore()));
	}

	void resultArrived(DesignResult result) {
		lastResult = result;
	}

	/** True once the editor is closed: a check still running for it must not publish anything. */
	public boolean isClosed() {
		return closed;
	}

	@Override
	public void dispose() {
		closed = true;
		super.dispose();
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
