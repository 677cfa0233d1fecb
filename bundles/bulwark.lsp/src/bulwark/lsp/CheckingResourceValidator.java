package bulwark.lsp;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.xtext.diagnostics.Severity;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.validation.CheckMode;
import org.eclipse.xtext.validation.Issue;
import org.eclipse.xtext.validation.ResourceValidatorImpl;

import com.google.inject.Inject;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.load.LoadedDesign;
import bulwark.lang.design.Design;
import bulwark.lang.diagnostics.FirstSyntaxErrors;

/**
 * The language server's validation: the language's own issues, then — when the text is a sound design —
 * the whole check (every case and rule), its findings as issues coded by rule ID, so that an editor shows
 * them as diagnostics and asks for their code actions. A cancelled check publishes nothing new.
 */
public class CheckingResourceValidator extends ResourceValidatorImpl {
	@Inject
	private OpenDesigns designs;

	@Override
	public List<Issue> validate(Resource resource, CheckMode mode, CancelIndicator cancel) {
		List<Issue> language = super.validate(resource, mode, cancel);
		// one error per broken statement, as the command line reports them
		List<Issue> issues = new ArrayList<>(resource instanceof XtextResource r ? FirstSyntaxErrors.of(r, language) : language);
		boolean errors = issues.stream().anyMatch(i -> i.getSeverity() == Severity.ERROR);
		if (errors || cancel.isCanceled() || resource.getContents().isEmpty()
				|| !(resource.getContents().get(0) instanceof Design design) || !(resource instanceof XtextResource x)
				|| x.getParseResult() == null) {
			return issues;
		}
		String text = x.getParseResult().getRootNode().getText();
		if (bulwark.check.load.InputLimits.check(text).isPresent()) {
			Issue.IssueImpl refused = new Issue.IssueImpl();
			refused.setSeverity(Severity.ERROR);
			refused.setMessage("not checked: " + bulwark.check.load.InputLimits.check(text).get().message());
			refused.setCode("file");
			refused.setLineNumber(1);
			refused.setColumn(1);
			refused.setOffset(0);
			refused.setLength(0);
			issues.add(refused);
			return issues;
		}
		String file = resource.getURI().isFile() ? resource.getURI().toFileString() : resource.getURI().lastSegment();
		DesignResult result;
		try {
			result = designs.checker().check(new LoadedDesign(file, text, design, issues));
		} catch (RuntimeException | LinkageError e) {
			// never a silent pass: say that the design was not checked, and why
			Issue.IssueImpl failed = new Issue.IssueImpl();
			failed.setSeverity(Severity.ERROR);
			failed.setMessage("not checked: " + e);
			failed.setCode("internal");
			failed.setLineNumber(1);
			failed.setColumn(1);
			failed.setOffset(0);
			failed.setLength(0);
			issues.add(failed);
			return issues;
		}
		if (cancel.isCanceled()) {
			return issues;
		}
		designs.put(resource.getURI().toString(), new OpenDesigns.Checked(text, result));
		for (Finding f : result.findings()) {
			if (!f.rule().text().equals("syntax") && !f.rule().text().equals("structure")) {
				issues.add(issue(f, text));
			}
		}
		return issues;
	}

	private static Issue issue(Finding f, String text) {
		Issue.IssueImpl issue = new Issue.IssueImpl();
		issue.setSeverity(switch (f.severity()) {
		case ERROR -> f.waived() ? Severity.INFO : Severity.ERROR;
		case WARNING -> Severity.WARNING;
		default -> Severity.INFO;
		});
		// the rule is the diagnostic's code, which editors show beside the message: not twice
		issue.setMessage(f.message());
		issue.setCode(f.rule().text());
		int offset = Math.max(0, Math.min(f.location().offset(), text.length()));
		int length = Math.max(0, Math.min(f.location().length(), text.length() - offset));
		int line = Math.max(1, f.location().line()), column = Math.max(1, f.location().column());
		issue.setOffset(offset);
		issue.setLength(length);
		issue.setLineNumber(line);
		issue.setColumn(column);
		issue.setLineNumberEnd(line);
		issue.setColumnEnd(column + length);
		return issue;
	}
}
