package bulwark.check.finding;

import java.util.Objects;

/**
 * What a finding is about: a part (null for the whole design), a case (null when none) and where in the text.
 */
public record Subject(String part, String caseName, SourceLocation location) {
	/** The whole design, at no particular place in its text. */
	public static final Subject DESIGN = new Subject(null, null, SourceLocation.NONE);

	public Subject {
		Objects.requireNonNull(location);
	}
}
