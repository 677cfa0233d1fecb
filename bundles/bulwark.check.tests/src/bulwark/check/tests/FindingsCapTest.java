package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.Status;
import bulwark.check.finding.CheckerRules;
import bulwark.check.finding.Finding;
import bulwark.check.finding.FindingDetail;
import bulwark.check.finding.FindingsCap;
import bulwark.check.finding.Severity;
import bulwark.check.rules.RatingMissingRule;
import bulwark.check.rules.ResistorPowerRule;

/** A design lists at most 100 findings; the rest are counted in one, and still decide the status. */
class FindingsCapTest {
	/** 150 unrated resistors (a warning each) and, last in the text, one over its power rating. */
	private static String manyUnrated() {
		StringBuilder s = new StringBuilder("design \"many unrated\"\nreference net gnd\nnet a\n"
				+ "source V1 (plus: a, minus: gnd) { voltage 5 V }\n");
		for (int i = 1; i <= 150; i++) {
			s.append("resistor R").append(i).append(" (a: a, b: gnd) { value 100 kΩ }\n");
		}
		// 5 V across 10 Ω: 2.5 W against 125 mW [closed form, Joule's law]
		return s.append("resistor R_HOT (a: a, b: gnd) { value 10 Ω rated power 125 mW rated voltage 200 V }\n").toString();
	}

	@Test
	void listsTheMostSevereFirstAndCountsTheRest() {
		DesignResult r = Fixtures.check(manyUnrated());
		assertEquals(FindingsCap.MAX, r.findings().size());
		// the error, last in the text, is kept ahead of the warnings before it
		assertEquals(1, r.findings().stream().filter(f -> f.rule().equals(ResistorPowerRule.ID)).count());
		Finding omitted = r.findings().get(r.findings().size() - 1);
		assertEquals(CheckerRules.OMITTED.id(), omitted.rule());
		assertEquals(Severity.WARNING, omitted.severity()); // the most severe of those left out
		FindingDetail.Omitted counts = (FindingDetail.Omitted) omitted.detail();
		// 150 warnings, 98 listed besides the error
		assertEquals(150 - 98, counts.warnings());
		assertTrue(omitted.message().startsWith("and 52 more finding(s) not listed (52 warning(s)), from line "),
				omitted.message());
		assertEquals(150, r.count(Severity.WARNING));
		assertEquals(1, r.errorCount());
		assertEquals(Status.FAIL, r.status());
		// the listed warnings are the first in the text
		assertEquals("R1", r.findings().get(0).part());
		assertTrue(r.findings().stream().limit(98).allMatch(f -> f.rule().equals(RatingMissingRule.ID)
				|| f.rule().equals(ResistorPowerRule.ID)));
	}

	@Test
	void aShortListIsLeftAlone() {
		String text = manyUnrated().replaceAll("resistor R(1[0-4][0-9]|150|[2-9][0-9]) .*\n", "");
		DesignResult r = Fixtures.check(text);
		assertTrue(r.findings().size() < FindingsCap.MAX, r.findings().size() + " findings");
		assertTrue(r.findings().stream().noneMatch(f -> f.rule().equals(CheckerRules.OMITTED.id())));
	}
}
