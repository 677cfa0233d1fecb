package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.BatteryChargeRule;
import bulwark.check.finding.RuleId;

class BatteryChargeRuleTest {
	private static final RuleId ID = BatteryChargeRule.ID;

	/**
	 * 24 V on the tip drives (24 − 3)/10 kΩ = 2.1 mA into a 3 V primary cell [closed form, Ohm's law], over
	 * the 10 µA assumed for a primary cell.
	 */
	private static final String OVER = """
			design "cell charged from the tip"
			reference net gnd
			net tip
			net vbat
			terminal TIP at tip
			terminal COM at gnd common
			battery B1 (plus: vbat, minus: gnd) { emf 3 V capacity 225 mAh } #! battery-charge
			resistor R1 (a: tip, b: vbat) { value 10 kΩ rated power 250 mW package 0805 }
			case "24 V on the tip" { apply 24 V from TIP to COM }
			""";

	@Test
	void triggersWhenAFaultChargesAPrimaryCell() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals((24 - 3) / 10e3, f.value(), 1e-12);
		assertEquals(10e-6, f.limit(), 0);
		assertTrue(f.message().contains("the assumed primary-cell 10 µA"), f.message());
	}

	@Test
	void silentBehindABlockingDiode() {
		String within = Fixtures.replaced(Fixtures.replaced(OVER, "resistor R1 (a: tip, b: vbat)", "resistor R1 (a: tip, b: k)"), " #! battery-charge", "")
				+ "net k\ndiode D1 (anode: vbat, cathode: k) { rated reverse 100 V rated forward 200 mA }\n";
		DesignResult r = Fixtures.check(within);
		assertEquals(Fixtures.expected(within, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
