package bulwark.check.finding;

import java.util.Locale;

/** How bad a finding is; only errors fail a design. */
public enum Severity {
	ERROR, WARNING, INFO;

	public String id() {
		return name().toLowerCase(Locale.ROOT);
	}
}
