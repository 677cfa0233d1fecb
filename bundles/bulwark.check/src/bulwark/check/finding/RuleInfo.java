package bulwark.check.finding;

import java.util.Objects;

/** A rule's fixed facts: its ID, its concern, its default severity and a one-line summary. */
public record RuleInfo(RuleId id, Concern concern, Severity severity, String summary) {
	public RuleInfo {
		Objects.requireNonNull(id);
		Objects.requireNonNull(concern);
		Objects.requireNonNull(severity);
		if (summary == null || summary.isBlank() || summary.endsWith(".")) {
			throw new IllegalArgumentException("a rule summary is one phrase without a full stop: " + id);
		}
	}

	public RuleInfo(String id, Concern concern, Severity severity, String summary) {
		this(RuleId.of(id), concern, severity, summary);
	}
}
