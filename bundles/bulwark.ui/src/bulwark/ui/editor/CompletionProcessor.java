package bulwark.ui.editor;

import java.util.List;

import org.eclipse.jface.text.ITextViewer;
import org.eclipse.jface.text.contentassist.CompletionProposal;
import org.eclipse.jface.text.contentassist.ICompletionProposal;
import org.eclipse.jface.text.contentassist.IContentAssistProcessor;
import org.eclipse.jface.text.contentassist.IContextInformation;
import org.eclipse.jface.text.contentassist.IContextInformationValidator;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistEntry;

import bulwark.lang.ide.contentassist.Completion;
import bulwark.ui.BulwarkUi;

/** Ctrl+Space: the language's proposals at the caret (keywords, names, pins, settings, units). */
public class CompletionProcessor implements IContentAssistProcessor {
	private final DesignEditor editor;

	public CompletionProcessor(DesignEditor editor) {
		this.editor = editor;
	}

	/** The proposals at an offset of the current text; the API the popup uses. */
	public List<ContentAssistEntry> entriesAt(String text, int offset) {
		String file = editor.file() == null ? "untitled.bulwark" : editor.file().toString();
		return Completion.at(BulwarkUi.checker().loader().injector(), text, file, offset);
	}

	@Override
	public ICompletionProposal[] computeCompletionProposals(ITextViewer viewer, int offset) {
		return entriesAt(viewer.getDocument().get(), offset).stream().map(e -> {
			String prefix = e.getPrefix() == null ? "" : e.getPrefix();
			return (ICompletionProposal) new CompletionProposal(e.getProposal(), offset - prefix.length(), prefix.length(),
					e.getProposal().length(), null, e.getLabel() != null ? e.getLabel() : e.getProposal(), null,
					e.getDescription());
		}).toArray(ICompletionProposal[]::new);
	}

	@Override
	public IContextInformation[] computeContextInformation(ITextViewer viewer, int offset) {
		return null;
	}

	@Override
	public char[] getCompletionProposalAutoActivationCharacters() {
		return new char[] { '(', '{' };
	}

	@Override
	public char[] getContextInformationAutoActivationCharacters() {
		return null;
	}

	@Override
	public String getErrorMessage() {
		return null;
	}

	@Override
	public IContextInformationValidator getContextInformationValidator() {
		return null;
	}
}
