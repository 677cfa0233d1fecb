package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.load.InputLimits;
import bulwark.check.Status;

/** Oversized files, overlong lines and binary data are refused with a located reason, before parsing. */
class InputLimitsTest {
	private static final String GOOD = "design \"x\"\nreference net gnd\nnet a\n";

	@Test
	void overlongLineIsRefusedWhereItIs() {
		DesignResult r = Fixtures.check(GOOD + "# " + "x".repeat(InputLimits.MAX_LINE) + "\n");
		assertEquals(Status.ERROR, r.status());
		Finding f = r.findings().get(0);
		assertEquals(4, f.location().line());
		assertTrue(f.message().startsWith("line 4 has"), f.message());
	}

	@Test
	void hugeTextIsRefused() {
		String big = (GOOD + "#" + "y".repeat(1000) + "\n").repeat(InputLimits.MAX_CHARACTERS / 1000 + 1);
		DesignResult r = Fixtures.check(big);
		assertEquals(Status.ERROR, r.status());
		assertTrue(r.findings().get(0).message().contains("designs are limited to"));
	}

	@Test
	void binaryDataIsRefused() {
		DesignResult r = Fixtures.check(GOOD + "net b\u0000\n");
		assertEquals(Status.ERROR, r.status());
		assertEquals(4, r.findings().get(0).location().line());
		assertEquals(6, r.findings().get(0).location().column());
	}

	@Test
	void ordinaryDesignsPass() {
		assertTrue(InputLimits.check(GOOD).isEmpty());
	}
}
