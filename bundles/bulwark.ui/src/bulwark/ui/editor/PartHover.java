package bulwark.ui.editor;

import java.util.Locale;

import org.eclipse.jface.text.BadLocationException;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.IRegion;
import org.eclipse.jface.text.ITextHover;
import org.eclipse.jface.text.ITextViewer;
import org.eclipse.jface.text.Region;

import bulwark.check.cases.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.cases.PartStress;
import bulwark.check.figures.Figures;

/**
 * Hovering over a part's designator shows its worst stress: the utilisation against its rating, which
 * rating limits it, the case it happens in, and the part's findings.
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
		PartStress worst = null;
		String worstCase = null;
		boolean known = false;
		for (CaseResult c : result.cases()) {
			for (PartStress p : c.parts()) {
				if (!p.part().equals(part)) {
					continue;
				}
				known = true;
				if (p.utilisation() != null && (worst == null || p.utilisation() > worst.utilisation())) {
					worst = p;
					worstCase = c.name();
				}
			}
		}
		if (!known) {
			return null;
		}
		StringBuilder text = new StringBuilder(part);
		if (worst == null) {
			text.append(": no rating to compare its stress with");
		} else {
			text.append(String.format(Locale.ROOT, ": worst %.0f %% of its %s rating, in case '%s' (%s, %s, %s)",
					100 * worst.utilisation(), worst.limiting(), worstCase, Figures.engineering(Math.abs(worst.voltage()), "V"),
					Figures.engineering(Math.abs(worst.current()), "A"), Figures.engineering(Math.abs(worst.power()), "W")));
		}
		for (Finding f : result.findings()) {
			if (part.equals(f.part())) {
				text.append('\n').append(f.severity().id()).append(f.waived() ? " (waived) " : " ").append(f.rule())
						.append(": ").append(f.message());
				bulwark.check.rules.RulePages.what(bulwark.ui.BulwarkUi.installation(), f.rule())
						.ifPresent(w -> text.append("\n    (").append(f.rule()).append(": ").append(w.replace('\n', ' ')).append(')'));
			}
		}
		return text.toString();
	}
}
