package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.finding.Concern;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.Status;
import bulwark.check.rules.ResistorPowerRule;
import bulwark.check.finding.RuleId;

class ResistorPowerRuleTest {
	private static final RuleId ID = ResistorPowerRule.ID;

	/** 12 V across 150 Ω + 100 Ω: I = 48 mA, P(150 Ω) = I²R = 0.3456 W [closed form, Joule's law]. */
	static final String OVER = """
			design "power over rating"
			reference net gnd
			net bench
			net lamp
			source V1 (plus: bench, minus: gnd) { voltage 12 V }
			resistor R_DROP (a: bench, b: lamp) { #! resistor-power
			  value 150 Ω
			  rated power 125 mW rated voltage 200 V
			}
			resistor R_LAMP (a: lamp, b: gnd) { value 100 Ω rated power 2 W rated voltage 200 V }
			""";

	/** Same circuit with a 0.5 W dropping resistor: 0.3456 W is within its rating. */
	static final String WITHIN = Fixtures.replaced(Fixtures.replaced(OVER, "125 mW", "500 mW"), " #! resistor-power", "");

	@Test
	void triggersOnOverRatedResistor() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		double current = 12.0 / (150 + 100);
		double power = current * current * 150; // Joule's law, closed form
		assertEquals(power, f.value(), power * 1e-12);
		assertEquals(0.125, f.limit(), 1e-15);
		assertEquals("W", f.unit());
		assertEquals("R_DROP", f.part());
		assertEquals(Concern.POWER, f.concern());
		assertEquals(Severity.ERROR, f.severity());
		assertEquals(6, f.location().line());
		assertEquals(10, f.location().column()); // the designator after "resistor "
		assertTrue(f.message().contains("346 mW") && f.message().contains("125 mW") && f.message().contains("276 %"),
				f.message());
		assertEquals(Status.FAIL, r.status());
	}

	@Test
	void silentWithinRating() {
		DesignResult r = Fixtures.check(WITHIN);
		assertEquals(Fixtures.expected(WITHIN, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
		assertEquals(Status.PASS, r.status(), r.findings().toString());
	}

	@Test
	void batteryInternalResistanceLowersDissipation() {
		// 9 V, 1.7 Ω internal, 47 Ω load: P = (9/(48.7))²·47 = 1.605 W [closed form]; rated 1.6 W → just over.
		String text = """
				design "battery"
				reference net gnd
				net p
				battery B1 (plus: p, minus: gnd) { emf 9 V resistance 1.7 Ω }
				resistor R1 (a: p, b: gnd) { value 47 Ω rated power 1.6 W } #! resistor-power
				""";
		DesignResult r = Fixtures.check(text);
		assertEquals(Fixtures.expected(text, ID), Fixtures.actual(r, ID));
		double i = 9 / 48.7;
		assertEquals(i * i * 47, Fixtures.only(r, ID).value(), 1e-12);
	}
}
