package bulwark.check;

/**
 * One finding. {@code value}, {@code limit} and {@code unit} are SI figures behind the message (null when a
 * finding has none); {@code part} and {@code caseName} are null when the finding concerns the whole design.
 */
public record Finding(String rule, Concern concern, Severity severity, String message, String part,
		String caseName, SourceLocation location, Double value, Double limit, String unit, boolean waived) {

	/** The same finding at another severity, as a review policy may set it. */
	public Finding withSeverity(Severity other) {
		return new Finding(rule, concern, other, message, part, caseName, location, value, limit, unit, waived);
	}

	/** A finding with no figures, for example a language error. */
	public static Finding plain(String rule, Concern concern, Severity severity, String message, String part,
			SourceLocation location) {
		return new Finding(rule, concern, severity, message, part, null, location, null, null, null, false);
	}
}
