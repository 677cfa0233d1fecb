package bulwark.ui.editor;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.eclipse.jface.text.BadLocationException;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.contentassist.ICompletionProposal;
import org.eclipse.jface.text.contentassist.IContextInformation;
import org.eclipse.jface.text.quickassist.IQuickAssistInvocationContext;
import org.eclipse.jface.text.quickassist.IQuickAssistProcessor;
import org.eclipse.jface.text.source.Annotation;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.Point;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.fix.Fix;
import bulwark.check.fix.TextEdit;
import bulwark.fix.QuickFixes;
import bulwark.ui.BulwarkUi;

/**
 * Ctrl+1: the verified quick fixes (bulwark.lang.ide) of the findings on the caret's line, each showing what
 * it changes and the figures before → after; choosing one applies its edits to the document.
 */
public class FixProposals implements IQuickAssistProcessor {
	private final DesignEditor editor;

	public FixProposals(DesignEditor editor) {
		this.editor = editor;
	}

	/** The fixes offered at a 1-based line of the current text; the API the Ctrl+1 popup uses. */
	public List<Fix> fixesAt(int line) {
		DesignResult result = editor.lastResult();
		IDocument doc = editor.getDocumentProvider().getDocument(editor.getEditorInput());
		if (result == null || doc == null) {
			return List.of();
		}
		String file = editor.file() == null ? result.file() : editor.file().toString();
		Map<Finding, List<Fix>> all = QuickFixes.of(BulwarkUi.checker(), doc.get(), file, result);
		List<Fix> here = new ArrayList<>();
		all.forEach((f, fixes) -> {
			if (f.location().line() == line) {
				here.addAll(fixes);
			}
		});
		return here;
	}

	/** Applies a fix's edits to the document, last offset first as the fix lists them. */
	public void apply(Fix fix) {
		IDocument doc = editor.getDocumentProvider().getDocument(editor.getEditorInput());
		try {
			for (TextEdit e : fix.edits()) {
				doc.replace(e.offset(), e.length(), e.text());
			}
		} catch (BadLocationException e) {
			throw new IllegalStateException("the design changed under the fix", e);
		}
	}

	@Override
	public ICompletionProposal[] computeQuickAssistProposals(IQuickAssistInvocationContext context) {
		try {
			int line = context.getSourceViewer().getDocument().getLineOfOffset(context.getOffset()) + 1;
			return fixesAt(line).stream().map(Proposal::new).toArray(ICompletionProposal[]::new);
		} catch (BadLocationException e) {
			return new ICompletionProposal[0];
		}
	}

	@Override
	public String getErrorMessage() {
		return null;
	}

	@Override
	public boolean canFix(Annotation annotation) {
		return annotation instanceof FindingAnnotation;
	}

	@Override
	public boolean canAssist(IQuickAssistInvocationContext invocationContext) {
		return true;
	}

	private final class Proposal implements ICompletionProposal {
		private final Fix fix;

		Proposal(Fix fix) {
			this.fix = fix;
		}

		@Override
		public void apply(IDocument document) {
			FixProposals.this.apply(fix);
		}

		@Override
		public Point getSelection(IDocument document) {
			return null;
		}

		@Override
		public String getAdditionalProposalInfo() {
			return "before: " + bulwark.check.figures.NamedFigures.of(fix.before()) + "\nafter: "
					+ bulwark.check.figures.NamedFigures.of(fix.after());
		}

		@Override
		public String getDisplayString() {
			return fix.label();
		}

		@Override
		public Image getImage() {
			return null;
		}

		@Override
		public IContextInformation getContextInformation() {
			return null;
		}
	}
}
