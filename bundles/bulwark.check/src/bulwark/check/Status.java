package bulwark.check;

import java.util.Locale;

/** Outcome of one design: pass (no error finding), fail (error findings), error (could not be checked). */
public enum Status {
	PASS, FAIL, ERROR;

	public String id() {
		return name().toLowerCase(Locale.ROOT);
	}
}
