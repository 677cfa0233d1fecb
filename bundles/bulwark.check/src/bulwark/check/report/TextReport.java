package bulwark.check.report;

import java.io.IOException;
import java.io.Writer;
import java.util.List;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;

/** One line per finding: {@code FILE:LINE:COL: severity rule message}. */
public final class TextReport {
	private TextReport() {
	}

	public static void write(List<DesignResult> results, Writer w) throws IOException {
		for (DesignResult r : results) {
			for (Finding f : r.findings()) {
				w.write(line(r.file(), f));
				w.write('\n');
			}
		}
		w.flush();
	}

	public static String line(String file, Finding f) {
		// control characters of a title or file name are shown, never written raw (see Printable)
		return Printable.of(file) + ":" + f.location().line() + ":" + f.location().column() + ": " + f.severity().id()
				+ (f.waived() ? " (waived)" : "") + " " + f.rule() + " " + Printable.of(f.message().replace('\n', ' '));
	}
}
