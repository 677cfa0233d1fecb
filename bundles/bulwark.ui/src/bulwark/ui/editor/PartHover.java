package bulwark.ui.editor;


import org.eclipse.jface.text.BadLocationException;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.IRegion;
import org.eclipse.jface.text.ITextHover;
import org.eclipse.jface.text.ITextViewer;
import org.eclipse.jface.text.Region;

import bulwark.check.DesignResult;
import bulwark.check.report.PartSummary;


/**
 * Hovering over a part's designator shows its summary (PartSummary, the same as the language server's):
 * its worst stress against each rating, the case it happens in, and its findings.
 */
final class PartHover implements ITextHover {
	private final DesignEditor editor;

	PartHover(DesignEditor editor) {
		this.editor = editor;
	}

	@Override
	public IRegion getHoverRegion(ITextViewer viewer, int offset) {
		IDocument doc = viewer.getDocument();
		int start = offset, end = offset;
		try {
			while (start > 0 && isNameChar(doc.getChar(start - 1))) {
				start--;
			}
			while (end < doc.getLength() && isNameChar(doc.getChar(end))) {
				end++;
			}
		} catch (BadLocationException e) {
			return new Region(offset, 0);
		}
		return new Region(start, end - start);
	}

	@Override
	public String getHoverInfo(ITextViewer viewer, IRegion region) {
		DesignResult result = editor.lastResult();
		if (result == null || region.getLength() == 0) {
			return null;
		}
		try {
			return describe(result, viewer.getDocument().get(region.getOffset(), region.getLength()));
		} catch (BadLocationException e) {
			return null;
		}
	}

	private static boolean isNameChar(char c) {
		return Character.isLetterOrDigit(c) || c == '_';
	}

	/** The hover text for a part, or null when the name is not a part of the last check. */
	static String describe(DesignResult result, String part) {
		return PartSummary.of(result, part, bulwark.ui.BulwarkUi.installation()).map(PartSummary::text).orElse(null);
	}
}
