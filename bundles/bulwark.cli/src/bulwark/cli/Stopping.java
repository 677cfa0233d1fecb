package bulwark.cli;

import java.io.PrintWriter;

import bulwark.check.finding.Finding;
import bulwark.check.Preparation;
import bulwark.check.finding.Severity;
import bulwark.check.report.TextReport;

/** Says why a design could not be prepared, one located line per error, as the check's report writes them. */
final class Stopping {
	private Stopping() {
	}

	static void explain(Preparation.Stopped stopped, PrintWriter err) {
		for (Finding f : stopped.result().findings()) {
			if (f.severity() == Severity.ERROR) {
				err.println(TextReport.line(stopped.result().file(), f));
			}
		}
		err.flush();
	}
}
