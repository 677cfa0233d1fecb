package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.DevicePowerRule;
import bulwark.check.finding.RuleId;

class DevicePowerRuleTest {
	private static final RuleId ID = DevicePowerRule.ID;

	/** 12 V across a 100 Ω indicator: P = V²/R = 1.44 W [closed form, Joule's law], over its rated 1 W. */
	private static final String OVER = """
			design "indicator over its power"
			reference net gnd
			net bus
			source V1 (plus: bus, minus: gnd) { voltage 12 V }
			indicator L1 (a: bus, b: gnd) { resistance 100 Ω rated power 1 W } #! device-power
			""";

	@Test
	void triggersOnAnIndicatorOverItsPower() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(12.0 * 12.0 / 100, f.value(), 1e-12);
		assertEquals(1.0, f.limit(), 0);
		assertEquals("W", f.unit());
	}

	@Test
	void silentWithinItsPower() {
		String within = Fixtures.replaced(OVER, "rated power 1 W } #! device-power", "rated power 2 W }");
		DesignResult r = Fixtures.check(within);
		assertEquals(Fixtures.expected(within, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
