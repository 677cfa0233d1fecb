package bulwark.check.load;

import java.util.List;

import org.eclipse.xtext.validation.Issue;

import bulwark.lang.design.Design;

/** A parsed and validated design text: the model (null when nothing parsed) and the language's issues. */
public record LoadedDesign(String file, String text, Design design, List<Issue> issues) {
	public LoadedDesign {
		issues = List.copyOf(issues);
	}
}
