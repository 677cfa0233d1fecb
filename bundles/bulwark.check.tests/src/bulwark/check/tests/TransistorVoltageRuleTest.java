package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.TransistorVoltageRule;
import bulwark.check.finding.RuleId;

class TransistorVoltageRuleTest {
	private static final RuleId ID = TransistorVoltageRule.ID;

	/** A transistor held off with its collector at the probe tip: the whole 100 V applied is across it. */
	private static final String OVER = """
			design "transistor across the fault"
			reference net gnd
			net tip
			net c
			terminal TIP at tip
			terminal COM at gnd common
			resistor R1 (a: tip, b: c) { value 10 kΩ rated power 1 W package 2512 }
			resistor R2 (a: gnd, b: b) { value 10 kΩ rated power 250 mW package 0805 }
			net b
			npn Q1 (collector: c, base: b, emitter: gnd) { rated collector_emitter 45 V } #! transistor-voltage
			case "100 V on the tip" { apply 100 V from TIP to COM }
			""";

	@Test
	void triggersWhenTheFaultIsAcrossCollectorAndEmitter() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(100, f.value(), 1e-3); // off: only leakage flows through R1 [closed form]
		assertEquals(45, f.limit(), 0);
		assertEquals("100 V on the tip", f.caseName());
	}

	@Test
	void silentWithAHigherRating() {
		String within = Fixtures.replaced(OVER, "45 V } #! transistor-voltage", "150 V }");
		DesignResult r = Fixtures.check(within);
		assertEquals(Fixtures.expected(within, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
