package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.FuseVoltageRule;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.ResistorPowerRule;

class FuseVoltageRuleTest {
	private static final RuleId ID = FuseVoltageRule.ID;

	/**
	 * A 50 mA fuse before 100 Ω: 357.8 V drives 3.6 A, the fuse opens, and the case solved again with it open
	 * leaves the whole 357.8 V across it, over its rated 125 V.
	 */
	private static final String OVER = """
			design "fuse that cannot break mains"
			reference net gnd
			net tip
			net sense
			terminal TIP at tip
			terminal COM at gnd common
			fuse F1 (a: tip, b: sense) { rated current 50 mA rated voltage 125 V } #! fuse-voltage
			resistor R1 (a: sense, b: gnd) { value 100 Ω rated power 5 W package 2512 }
			case "mains peak" { apply 357.8 V from TIP to COM }
			""";

	@Test
	void triggersWhenTheOpenedFuseHoldsMoreThanItsRating() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals("mains peak, F1 open", f.caseName());
		assertEquals(357.8, f.value(), 1e-4); // 1 GΩ open against 100 Ω [closed form, divider]
		assertEquals(125, f.limit(), 0);
		// with the fuse open, R1 is no longer stressed
		Fixtures.assertSilent(r, ResistorPowerRule.ID);
	}

	@Test
	void silentWithAMainsRatedFuse() {
		String within = Fixtures.replaced(OVER, "rated voltage 125 V } #! fuse-voltage", "rated voltage 500 V }");
		DesignResult r = Fixtures.check(within);
		assertEquals(Fixtures.expected(within, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
