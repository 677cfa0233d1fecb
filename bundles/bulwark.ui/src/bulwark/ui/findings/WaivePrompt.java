package bulwark.ui.findings;

import java.util.Locale;
import java.util.Optional;

import bulwark.check.finding.Finding;

/**
 * What the Waive dialogs say: the finding they waive in full, and a warning before waiving one more than
 * {@link #FAR_OVER} times over its limit — a waiver says the part survives, and a part at ten times its
 * rating does not [common practice: a review accepts a small, understood overrun, not an order of magnitude].
 */
public final class WaivePrompt {
	/** Over this multiple of its limit, a waiver is asked about twice. */
	public static final double FAR_OVER = 10;

	private WaivePrompt() {
	}

	/** The question, with the finding it is about. */
	public static String why(Finding f) {
		return "You are waiving:\n" + f.rule() + " on " + f.part() + ": " + f.message()
				+ "\n\nWhy is this finding acceptable? (kept with the waiver in every report)";
	}

	/** The warning to confirm first, when the finding is far over its limit. */
	public static Optional<String> farOver(Finding f) {
		if (f.value() == null || f.limit() == null || !(f.limit() > 0) || f.value() / f.limit() <= FAR_OVER) {
			return Optional.empty();
		}
		return Optional.of(String.format(Locale.ROOT,
				"%s is at %.0f %% of its limit, more than %.0f times over. A waiver says the part survives this;"
						+ " a part that far over its rating is usually a design to change. Waive it all the same?",
				f.part(), 100 * f.value() / f.limit(), FAR_OVER));
	}
}
