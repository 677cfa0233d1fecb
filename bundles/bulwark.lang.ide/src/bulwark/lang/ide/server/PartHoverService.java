package bulwark.lang.ide.server;

import java.util.Locale;
import java.util.stream.Collectors;

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

import bulwark.check.WorstStress;
import bulwark.check.figures.Figures;
import bulwark.check.rules.RulePages;

/**
 * Hovering over a part's name shows its worst stress against each derated rating and the case it happens
 * in, then its findings, each with what its rule finds (from the rule's explanation page); elsewhere Xtext's
 * own hover.
 */
public class PartHoverService extends HoverService {
	@Inject
	private Checks checks;

	@Override
	public Hover hover(Document document, XtextResource resource, HoverParams params, CancelIndicator cancel) {
		Checks.Checked checked = checks.get(resource.getURI().toString());
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
		StringBuilder md = new StringBuilder();
		for (WorstStress s : checked.result().stresses()) {
			if (s.part().equals(word)) {
				md.append(String.format(Locale.ROOT, "- %s: %s in case '%s'%s%n", s.what(),
						Figures.engineering(s.value(), s.unit()), s.caseName(),
						s.utilisation() == null ? " (no rating)"
								: String.format(Locale.ROOT, ", %.0f %% of %s", 100 * s.utilisation(),
										Figures.engineering(s.limit(), s.unit()))));
			}
		}
		if (md.length() == 0) {
			return super.hover(document, resource, params, cancel);
		}
		String findings = checked.result().findings().stream().filter(f -> word.equals(f.part()))
				.map(f -> "- **" + f.severity().id() + "** " + f.rule() + ": " + f.message()
						+ RulePages.what(checks.checker().loader().installation(), f.rule()).map(w -> "\n\n  *" + f.rule() + "*: " + w.replace("\n", " ")).orElse(""))
				.collect(Collectors.joining("\n"));
		String body = "**" + word + "**, worst stress per rating\n\n" + md + (findings.isEmpty() ? "" : "\n" + findings);
		return new Hover(new MarkupContent(MarkupKind.MARKDOWN, body),
				new Range(document.getPosition(start), document.getPosition(end)));
	}
}
