package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.StringWriter;
import java.util.List;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.report.HtmlReport;
import bulwark.check.report.JUnitReport;
import bulwark.check.report.JsonReport;
import bulwark.check.report.SarifReport;
import bulwark.check.report.TextReport;

/**
 * Reports are written straight into the caller's writer — a file being saved atomically, the command line's
 * standard output — and none of them may close it: the caller still has to flush, force and move the file,
 * and a closed standard output loses the summary and the safety caution written after the report.
 */
class ReportWritersTest {
	/** A writer that remembers being closed, and writes nothing more once it is. */
	private static final class Watched extends FilterWriter {
		boolean closed;

		Watched() {
			super(new StringWriter());
		}

		@Override
		public void close() throws IOException {
			closed = true;
			super.close();
		}

		int length() {
			return out.toString().length();
		}
	}

	private interface Report {
		void write(List<DesignResult> results, Watched w) throws Exception;
	}

	@Test
	void noReportClosesTheWriterItIsGiven() throws Exception {
		List<DesignResult> results = List.of(Fixtures.checkUnderDefault(MainsWaveformTest.DROPPER));
		List<Report> reports = List.of(
				(r, w) -> JsonReport.write(r, "test", "caution", w),
				(r, w) -> HtmlReport.write(r, "test", "caution", w),
				(r, w) -> SarifReport.write(r, "test", "caution", id -> null, w),
				(r, w) -> JUnitReport.write(r, w),
				(r, w) -> TextReport.write(r, w));
		for (Report report : reports) {
			Watched w = new Watched();
			report.write(results, w);
			assertFalse(w.closed, "a report closed its writer");
			int written = w.length();
			assertTrue(written > 100, "the report wrote " + written + " characters");
			w.write("after"); // the caller's own line after the report still goes out
			w.flush();
			assertTrue(w.length() == written + 5);
		}
	}
}
