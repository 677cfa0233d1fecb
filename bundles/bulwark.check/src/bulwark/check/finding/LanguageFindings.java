package bulwark.check.finding;

import org.eclipse.xtext.validation.Issue;

/** Language issues as findings: parse errors under concern syntax, everything else under structure. */
public final class LanguageFindings {
	private LanguageFindings() {
	}

	public static Finding of(Issue issue) {
		Severity severity;
		switch (issue.getSeverity()) {
		case ERROR:
			severity = Severity.ERROR;
			break;
		case WARNING:
			severity = Severity.WARNING;
			break;
		default:
			severity = Severity.INFO;
		}
		boolean syntax = issue.isSyntaxError();
		SourceLocation where = new SourceLocation(orZero(issue.getLineNumber()), orZero(issue.getColumn()),
				orZero(issue.getOffset()), orZero(issue.getLength()));
		return Finding.of(syntax ? CheckerRules.SYNTAX : CheckerRules.STRUCTURE, issue.getMessage()).withSeverity(severity)
				.at(where);
	}

	private static int orZero(Integer i) {
		return i == null ? 0 : i;
	}
}
