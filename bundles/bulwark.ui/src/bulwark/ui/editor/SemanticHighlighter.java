package bulwark.ui.editor;

import java.util.List;

import org.eclipse.jface.text.IRegion;
import org.eclipse.jface.text.ITextPresentationListener;
import org.eclipse.jface.text.TextPresentation;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.StyleRange;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.RGB;

import bulwark.lang.ide.highlight.SemanticRanges;
import bulwark.lang.ide.highlight.SemanticRanges.Range;

/**
 * Semantic highlighting, over the lexical colours: nets, terminals, parts and part definitions each in a
 * colour of their own, declarations bold, definitions italic — from the last parse (SemanticRanges), so a
 * net and a part read differently although both are plain names to the lexer.
 */
final class SemanticHighlighter implements ITextPresentationListener {
	private static final Color NET = new Color(new RGB(0, 118, 88));
	private static final Color TERMINAL = new Color(new RGB(168, 78, 0));
	private static final Color PART = new Color(new RGB(32, 44, 124));
	private static final Color DEFINITION = new Color(new RGB(112, 48, 122));

	private volatile List<Range> ranges = List.of();

	/** The ranges of the text now in the editor (the caller has checked it is the same text). */
	void set(List<Range> newRanges) {
		ranges = List.copyOf(newRanges);
	}

	/**
	 * Keeps the ranges in step with an edit until the next parse replaces them: those after it move, those it
	 * touches are dropped (they show lexically meanwhile), so no name is coloured at a stale offset.
	 */
	void edited(int offset, int removed, int inserted) {
		List<Range> shifted = new java.util.ArrayList<>();
		for (Range r : ranges) {
			if (r.offset() + r.length() < offset) {
				shifted.add(r);
			} else if (r.offset() > offset + removed) {
				shifted.add(new Range(r.offset() - removed + inserted, r.length(), r.kind(), r.declaration()));
			}
		}
		ranges = List.copyOf(shifted);
	}

	List<Range> ranges() {
		return ranges;
	}

	@Override
	public void applyTextPresentation(TextPresentation presentation) {
		IRegion extent = presentation.getExtent();
		List<Range> now = ranges;
		int from = extent.getOffset(), to = extent.getOffset() + extent.getLength();
		for (Range r : now) {
			// only the part inside the repainted extent: a presentation takes no style outside it
			int start = Math.max(r.offset(), from), end = Math.min(r.offset() + r.length(), to);
			if (end <= start) {
				continue;
			}
			StyleRange style = new StyleRange(start, end - start, color(r.kind()), null,
					(r.declaration() ? SWT.BOLD : SWT.NORMAL) | (r.kind() == SemanticRanges.Kind.DEFINITION ? SWT.ITALIC : SWT.NORMAL));
			presentation.mergeStyleRange(style);
		}
	}

	private static Color color(SemanticRanges.Kind kind) {
		return switch (kind) {
		case NET -> NET;
		case TERMINAL -> TERMINAL;
		case PART -> PART;
		case DEFINITION -> DEFINITION;
		};
	}
}
