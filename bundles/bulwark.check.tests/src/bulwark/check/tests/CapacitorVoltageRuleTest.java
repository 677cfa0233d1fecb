package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.CapacitorVoltageRule;
import bulwark.check.finding.RuleId;

class CapacitorVoltageRuleTest {
	private static final RuleId ID = CapacitorVoltageRule.ID;

	/** A 50 V capacitor straight across the terminals takes the whole 357.8 V mains peak (open at DC). */
	private static final String OVER = """
			design "capacitor across the fault"
			reference net gnd
			net tip
			terminal TIP at tip
			terminal COM at gnd common
			resistor R1 (a: tip, b: gnd) { value 10 MΩ rated power 250 mW rated voltage 500 V }
			capacitor C1 (a: tip, b: gnd) { value 100 nF rated voltage 50 V } #! capacitor-voltage
			case "mains peak" { apply 357.8 V from TIP to COM }
			""";

	@Test
	void triggersOnALowVoltageCapacitorAcrossTheFault() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(357.8, f.value(), 1e-9);
		assertEquals(50, f.limit(), 0);
	}

	@Test
	void silentWithAMainsRatedCapacitor() {
		String within = Fixtures.replaced(OVER, "rated voltage 50 V } #! capacitor-voltage", "rated voltage 630 V }");
		DesignResult r = Fixtures.check(within);
		assertEquals(Fixtures.expected(within, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
