package bulwark.ui.editor;

import org.eclipse.jface.text.source.Annotation;

import bulwark.check.finding.Finding;

/**
 * A finding shown in the editor. Its type is one of the editor's standard error/warning/info annotation
 * types, so the text editor draws it without further configuration.
 */
public final class FindingAnnotation extends Annotation {
	public static final String ERROR = "org.eclipse.ui.workbench.texteditor.error";
	public static final String WARNING = "org.eclipse.ui.workbench.texteditor.warning";
	public static final String INFO = "org.eclipse.ui.workbench.texteditor.info";

	private final Finding finding;

	FindingAnnotation(Finding finding) {
		super(typeOf(finding), false, finding.rule() + ": " + finding.message());
		this.finding = finding;
	}

	public Finding finding() {
		return finding;
	}

	private static String typeOf(Finding f) {
		switch (f.severity()) {
		case ERROR:
			return ERROR;
		case WARNING:
			return WARNING;
		default:
			return INFO;
		}
	}
}
