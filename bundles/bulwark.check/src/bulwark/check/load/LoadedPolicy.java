package bulwark.check.load;

import java.util.List;

import org.eclipse.xtext.validation.Issue;

import bulwark.lang.design.Policy;

/** A parsed and validated review policy: the model (null when none parsed) and the language's issues. */
public record LoadedPolicy(String file, Policy policy, List<Issue> issues) {
	public LoadedPolicy {
		issues = List.copyOf(issues);
	}
}
