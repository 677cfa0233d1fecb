package bulwark.lsp;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionKind;
import org.eclipse.lsp4j.Command;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.xtext.ide.server.Document;
import org.eclipse.xtext.ide.server.codeActions.ICodeActionService2;

import com.google.inject.Inject;

import bulwark.check.finding.Finding;
import bulwark.check.fix.Fix;
import bulwark.fix.QuickFixes;

/**
 * The quick fixes of bulwark.fix as code actions: for each diagnostic the editor sends back, the
 * verified fixes of the finding it shows, each a workspace edit of the document. The framework's code-action
 * service is marked provisional, hence the restriction warnings set aside here.
 */
@SuppressWarnings("restriction")
public class QuickFixActions implements ICodeActionService2 {
	@Inject
	private OpenDesigns designs;

	@Override
	public List<Either<Command, CodeAction>> getCodeActions(Options options) {
		List<Either<Command, CodeAction>> actions = new ArrayList<>();
		org.eclipse.emf.common.util.URI uri = options.getResource() != null ? options.getResource().getURI()
				: org.eclipse.emf.common.util.URI.createURI(options.getURI());
		OpenDesigns.Checked checked = designs.get(uri.toString());
		Document document = options.getDocument();
		if (checked == null || document != null && !checked.text().equals(document.getContents())) {
			return actions; // the check of this text has not finished: no stale fixes
		}
		String file = uri.isFile() ? uri.toFileString() : uri.lastSegment();
		Map<Finding, List<Fix>> fixes = QuickFixes.of(designs.checker(), checked.text(), file, checked.result());
		for (Diagnostic d : options.getCodeActionParams().getContext().getDiagnostics()) {
			String rule = d.getCode() == null ? null : d.getCode().isLeft() ? d.getCode().getLeft() : null;
			for (Map.Entry<Finding, List<Fix>> e : fixes.entrySet()) {
				Finding f = e.getKey();
				if (!f.rule().text().equals(rule) || f.location().line() != d.getRange().getStart().getLine() + 1) {
					continue;
				}
				for (Fix fix : e.getValue()) {
					CodeAction action = new CodeAction(fix.label());
					action.setKind(CodeActionKind.QuickFix);
					action.setDiagnostics(List.of(d));
					List<TextEdit> edits = new ArrayList<>();
					for (bulwark.check.fix.TextEdit edit : fix.edits()) {
						edits.add(new TextEdit(new Range(position(checked.text(), edit.offset()),
								position(checked.text(), edit.offset() + edit.length())), edit.text()));
					}
					action.setEdit(new WorkspaceEdit(Map.of(options.getURI() != null ? options.getURI() : uri.toString(), edits)));
					actions.add(Either.forRight(action));
				}
			}
		}
		return actions;
	}

	/** The protocol's position (0-based line, character) of an offset in the text. */
	static Position position(String text, int offset) {
		int line = 0, lineStart = 0;
		for (int i = 0; i < offset && i < text.length(); i++) {
			if (text.charAt(i) == '\n') {
				line++;
				lineStart = i + 1;
			}
		}
		return new Position(line, offset - lineStart);
	}
}
