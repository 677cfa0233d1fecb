package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.Status;
import bulwark.check.rules.ResistorPowerRule;

/** Waivers mark findings waived without hiding them, and stale waivers are reported. */
class WaiverTest {
	private static final String OVER = """
			design "waived"
			reference net gnd
			net v
			source V1 (plus: v, minus: gnd) { voltage 12 V }
			resistor R1 (a: v, b: gnd) { value 150 Ω rated power 125 mW rated voltage 200 V }
			""";

	@Test
	void waivedFindingStaysButNoLongerFails() {
		DesignResult r = Fixtures.check(OVER + "waive \"resistor-power\" on R1 because \"a 10 ms pulse, once\" by \"J. Okafor\" on \"2026-11-30\"\n");
		Finding f = Fixtures.only(r, ResistorPowerRule.ID);
		assertTrue(f.waived());
		assertTrue(f.message().endsWith("[waived by J. Okafor on 2026-11-30: a 10 ms pulse, once]"), f.message());
		assertEquals(Status.PASS, r.status());
	}

	@Test
	void staleAndUnknownWaiversAreReported() {
		DesignResult r = Fixtures.check(Fixtures.replaced(OVER, "150 Ω", "1.5 kΩ")
				+ "waive \"resistor-power\" on R1 because \"x\" by \"y\" on \"2026-11-30\"\n"
				+ "waive \"no-such-rule\" on R1 because \"x\" by \"y\" on \"2026-11-30\"\n");
		assertTrue(r.findings().stream().anyMatch(f -> f.rule().text().equals("waiver") && f.message().contains("matches no finding")),
				r.findings().toString());
		assertTrue(r.findings().stream().anyMatch(f -> f.rule().text().equals("waiver") && f.message().contains("'no-such-rule'")));
		assertEquals(Status.PASS, r.status());
	}

	@Test
	void waiverNeedsARealDate() {
		DesignResult r = Fixtures.check(OVER + "waive \"resistor-power\" on R1 because \"x\" by \"y\" on \"30/11/2026\"\n");
		assertEquals(Status.ERROR, r.status());
		assertTrue(r.findings().get(0).message().contains("yyyy-mm-dd"), r.findings().toString());
	}
}
