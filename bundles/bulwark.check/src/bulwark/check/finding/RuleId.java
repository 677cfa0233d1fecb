package bulwark.check.finding;

import java.util.Objects;

/**
 * A rule's stable ID: lower-case words joined by '-', the name of its page (docs/rules/ID.md), the key a
 * policy sets severities by and a waiver names. A type rather than a string, so that a finding is matched to
 * its rule by the rule's own constant, never by a literal that may drift.
 */
public record RuleId(String text) implements Comparable<RuleId> {
	public RuleId {
		Objects.requireNonNull(text, "a rule ID");
		if (!text.matches("[a-z]+(-[a-z]+)*")) {
			throw new IllegalArgumentException("rule IDs are lower-case words joined by '-': " + text);
		}
	}

	public static RuleId of(String text) {
		return new RuleId(text);
	}

	@Override
	public int compareTo(RuleId other) {
		return text.compareTo(other.text);
	}

	@Override
	public String toString() {
		return text;
	}
}
