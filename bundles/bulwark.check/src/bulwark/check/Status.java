package bulwark.check;

import java.util.Locale;

/**
 * Outcome of one design: pass (no error finding, every stress judged), pass with unchecked parts (no error
 * finding, but some part lacks a rating a rule needs, so that stress was not judged: never a plain pass),
 * fail (error findings), error (could not be checked).
 */
public enum Status {
	PASS("pass"), PASS_UNCHECKED("pass with unchecked parts"), FAIL("fail"), ERROR("not checked");

	private final String label;

	Status(String label) {
		this.label = label;
	}

	/** The word in machine-read outputs (JSON, CSV, CSS classes): pass, pass-unchecked, fail, error. */
	public String id() {
		return name().toLowerCase(Locale.ROOT).replace('_', '-');
	}

	/** What a reader sees. */
	public String label() {
		return label;
	}

	/** No error finding: the design passes, with or without unchecked parts. */
	public boolean passes() {
		return this == PASS || this == PASS_UNCHECKED;
	}
}
