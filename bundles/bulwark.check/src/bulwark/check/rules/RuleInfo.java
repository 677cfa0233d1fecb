package bulwark.check.rules;

import java.util.Objects;

import bulwark.check.Concern;
import bulwark.check.Severity;

/**
 * A rule's fixed facts: a stable ID (also the name of its explanation file, docs/rules/ID.md), its concern,
 * its default severity and a one-line summary.
 */
public record RuleInfo(String id, Concern concern, Severity severity, String summary) {
	public RuleInfo {
		Objects.requireNonNull(concern);
		Objects.requireNonNull(severity);
		if (id == null || !id.matches("[a-z]+(-[a-z]+)*")) {
			throw new IllegalArgumentException("rule IDs are lower-case words joined by '-': " + id);
		}
		if (summary == null || summary.isBlank() || summary.endsWith(".")) {
			throw new IllegalArgumentException("a rule summary is one phrase without a full stop: " + id);
		}
	}
}
