package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Severity;
import bulwark.check.Status;
import bulwark.check.rules.RatingMissingRule;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.ResistorPowerRule;
import bulwark.check.finding.Finding;

class RatingMissingRuleTest {
	private static final RuleId ID = RatingMissingRule.ID;

	private static final String MISSING = """
			design "unrated"
			reference net gnd
			net a
			source V1 (plus: a, minus: gnd) { voltage 5 V }
			resistor R1 (a: a, b: gnd) { value 1 kΩ rated voltage 150 V } #! rating-missing
			resistor R2 (a: a, b: gnd) { value 1 kΩ package 0805 rated power 250 mW }
			""";

	@Test
	void triggersOnResistorWithoutPowerRating() {
		DesignResult r = Fixtures.check(MISSING);
		assertEquals(Fixtures.expected(MISSING, ID), Fixtures.actual(r, ID));
		assertEquals(Severity.WARNING, Fixtures.only(r, ID).severity());
		// the warning names the rule that cannot check, never a silent pass
		assertTrue(Fixtures.only(r, ID).message().contains("power (resistor-power)"), Fixtures.only(r, ID).message());
		// a warning does not fail the design, but a part whose stress was not judged is never a plain pass
		assertEquals(Status.PASS_UNCHECKED, r.status());
		assertEquals("pass with unchecked parts", r.status().label());
		assertTrue(r.status().passes());
	}

	@Test
	void aWaivedMissingRatingIsAPlainPass() {
		// the engineer's waiver, with its justification, is a decision: the part is then accounted for
		String waived = MISSING + "waive \"rating-missing\" on R1 because \"a jumper, carries no power\" by \"kim\" on \"2026-12-04\"\n";
		DesignResult r = Fixtures.check(waived);
		assertTrue(Fixtures.only(r, ID).waived());
		assertEquals(Status.PASS, r.status());
	}

	@Test
	void namesEveryMissingRatingOfADiode() {
		String text = """
				design "unrated diode"
				reference net gnd
				net a
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				resistor R1 (a: a, b: k) { value 1 kΩ package 0805 rated power 250 mW }
				net k
				diode D1 (anode: k, cathode: gnd) { rated power 500 mW } #! rating-missing
				""";
		DesignResult r = Fixtures.check(text);
		assertEquals(Fixtures.expected(text, ID), Fixtures.actual(r, ID));
		String m = Fixtures.only(r, ID).message();
		assertTrue(m.contains("reverse (diode-reverse)") && m.contains("forward (forward-current)")
				&& !m.contains("device-power"), m);
	}

	@Test
	void silentWhenRated() {
		String rated = Fixtures.replaced(MISSING, "{ value 1 kΩ rated voltage 150 V } #! rating-missing", "{ value 1 kΩ rated voltage 150 V rated power 100 mW }");
		DesignResult r = Fixtures.check(rated);
		assertEquals(Fixtures.expected(rated, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
		assertEquals(Status.PASS, r.status());
	}

	@Test
	void aPackageWithoutAPowerRatingIsJudgedOnItsUsualOne() {
		// 0.96 W in an 0805 whose power rating was deleted: judged on the package's usual 125 mW [common
		// practice], never a pass with a warning
		String deleted = """
				design "deleted rating"
				reference net gnd
				net a
				source V1 (plus: a, minus: gnd) { voltage 31 V }
				resistor R1 (a: a, b: gnd) { value 1 kΩ package 0805 }
				""";
		DesignResult r = Fixtures.check(deleted);
		Fixtures.assertSilent(r, ID);
		Finding power = Fixtures.only(r, ResistorPowerRule.ID);
		assertEquals(31.0 * 31 / 1000, power.value(), 1e-9);
		assertEquals(0.125, power.limit(), 0);
		assertTrue(power.message().contains("over the assumed 0805 power rating 125 mW"), power.message());
		assertEquals(Status.FAIL, r.status());
	}
}
