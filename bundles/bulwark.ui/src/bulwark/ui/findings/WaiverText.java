package bulwark.ui.findings;

import java.time.LocalDate;

import bulwark.check.finding.Finding;

/** The text of a waiver for a finding, as the language writes it, appended at the end of the design. */
public final class WaiverText {
	private WaiverText() {
	}

	public static String of(Finding finding, String justification, String who, LocalDate date) {
		return "\nwaive \"" + escape(finding.rule().text()) + "\" on " + finding.part() + "\n  because \"" + escape(justification)
				+ "\" by \"" + escape(who) + "\" on \"" + date + "\"\n";
	}

	private static String escape(String s) {
		return s.replace("\\", "\\\\").replace("\"", "\\\"").replace('\n', ' ').replace('\r', ' ');
	}
}
