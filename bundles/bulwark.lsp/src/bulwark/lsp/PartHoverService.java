package bulwark.lsp;


import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.MarkupContent;
import org.eclipse.lsp4j.MarkupKind;
import org.eclipse.lsp4j.Range;
import org.eclipse.xtext.ide.server.Document;
import org.eclipse.xtext.ide.server.hover.HoverService;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.CancelIndicator;

import com.google.inject.Inject;

import bulwark.check.report.PartSummary;

/**
 * Hovering over a part's name shows its summary (PartSummary, the same text as the workbench's hover): its
 * worst stress against each rating and the case it happens in, then its findings with what each rule finds;
 * elsewhere the language framework's own hover.
 */
public class PartHoverService extends HoverService {
	@Inject
	private OpenDesigns designs;

	@Override
	public Hover hover(Document document, XtextResource resource, HoverParams params, CancelIndicator cancel) {
		OpenDesigns.Checked checked = designs.get(resource.getURI().toString());
		String text = document.getContents();
		int offset = document.getOffSet(params.getPosition());
		int start = offset, end = offset;
		while (start > 0 && Character.isJavaIdentifierPart(text.charAt(start - 1))) {
			start--;
		}
		while (end < text.length() && Character.isJavaIdentifierPart(text.charAt(end))) {
			end++;
		}
		String word = text.substring(start, end);
		if (checked == null || word.isEmpty()) {
			return super.hover(document, resource, params, cancel);
		}
		var summary = PartSummary.of(checked.result(), word, designs.checker().loader().installation());
		if (summary.isEmpty()) {
			return super.hover(document, resource, params, cancel);
		}
		String body = summary.get().markdown();
		return new Hover(new MarkupContent(MarkupKind.MARKDOWN, body),
				new Range(document.getPosition(start), document.getPosition(end)));
	}
}
