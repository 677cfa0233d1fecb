package bulwark.check.finding;

import java.util.Objects;
import java.util.Optional;

/**
 * One finding: which rule made it, its concern and severity, the message a person reads, and — for views,
 * reports and fixes, which never read the message — what it is about ({@link Subject}), the figure judged
 * ({@link Judged}, SI units) and any structured detail. Made by {@link #of} and the withers below, so that
 * no call site lines up positional fields.
 */
public record Finding(RuleId rule, Concern concern, Severity severity, String message, Subject subject, Judged figure,
		FindingDetail detail, boolean waived) {
	public Finding {
		Objects.requireNonNull(rule);
		Objects.requireNonNull(concern);
		Objects.requireNonNull(severity);
		Objects.requireNonNull(message);
		subject = subject == null ? Subject.DESIGN : subject;
		figure = figure == null ? Judged.NONE : figure;
	}

	/** A finding of the rule at its default severity, about the whole design, with no figure. */
	public static Finding of(RuleInfo rule, String message) {
		return new Finding(rule.id(), rule.concern(), rule.severity(), message, Subject.DESIGN, Judged.NONE, null, false);
	}

	/** The same finding about a part (or null), in a case (or null), at a place in the text. */
	public Finding about(String part, String caseName, SourceLocation location) {
		return new Finding(rule, concern, severity, message, new Subject(part, caseName, location), figure, detail, waived);
	}

	/** The same finding at a place in the text, about the whole design. */
	public Finding at(SourceLocation location) {
		return about(null, null, location);
	}

	/** The same finding with the figure it judged. */
	public Finding judged(Double value, Double limit, String unit) {
		return judged(null, value, limit, unit);
	}

	/** The same finding with the figure it judged against one of the part's ratings. */
	public Finding judged(String rating, Double value, Double limit, String unit) {
		return new Finding(rule, concern, severity, message, subject, new Judged(rating, value, limit, unit), detail,
				waived);
	}

	public Finding with(FindingDetail more) {
		return new Finding(rule, concern, severity, message, subject, figure, more, waived);
	}

	/** The same finding at another severity, as a review policy may set it. */
	public Finding withSeverity(Severity other) {
		return new Finding(rule, concern, other, message, subject, figure, detail, waived);
	}

	/** The same finding accepted by a waiver, its message saying by whom and why. */
	public Finding waivedAs(String newMessage) {
		return new Finding(rule, concern, severity, newMessage, subject, figure, detail, true);
	}

	private static final String WAIVED = " [waived by ";

	/** The same finding accepted by a waiver: "… [waived by WHO on DATE: JUSTIFICATION]". */
	public Finding waivedBy(String who, String date, String justification) {
		return waivedAs(message + WAIVED + who + " on " + date + ": " + justification + "]");
	}

	/** The reason its waiver gave, for reports with a field of their own for it (SARIF's suppressions). */
	public Optional<String> justification() {
		int at = waived ? message.lastIndexOf(WAIVED) : -1;
		int colon = at < 0 ? -1 : message.indexOf(": ", message.indexOf(" on ", at + WAIVED.length()));
		return colon < 0 || !message.endsWith("]") ? Optional.empty()
				: Optional.of(message.substring(colon + 2, message.length() - 1));
	}

	/** The same finding with another message (a policy file's problem, prefixed by the file's name). */
	public Finding saying(String newMessage) {
		return new Finding(rule, concern, severity, newMessage, subject, figure, detail, waived);
	}

	/** The detail of that type, when the finding has one. */
	public <T extends FindingDetail> Optional<T> detail(Class<T> type) {
		return type.isInstance(detail) ? Optional.of(type.cast(detail)) : Optional.empty();
	}

	public String part() {
		return subject.part();
	}

	public String caseName() {
		return subject.caseName();
	}

	public SourceLocation location() {
		return subject.location();
	}

	public Double value() {
		return figure.value();
	}

	public Double limit() {
		return figure.limit();
	}

	public String unit() {
		return figure.unit();
	}

	/** The rating the figure was judged against, or null. */
	public String rating() {
		return figure.rating();
	}
}
