package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.DiodeReverseRule;
import bulwark.check.finding.RuleId;

class DiodeReverseRuleTest {
	private static final RuleId ID = DiodeReverseRule.ID;

	/** An indicator LED on the probe tip: with 12 V applied the wrong way round it takes all 12 V in reverse. */
	private static final String EXPOSED = """
			design "led on the tip"
			reference net gnd
			net tip
			net a
			terminal TIP at tip
			terminal COM at gnd common
			resistor R1 (a: tip, b: a) { value 1 kΩ rated power 250 mW }
			led D1 (anode: a, cathode: gnd) { colour red rated reverse 5 V } #! diode-reverse
			case "12 V reversed" { apply 12 V from COM to TIP }
			""";

	/** The same with a diode across the LED the other way: the LED sees one forward drop in reverse. */
	private static final String PROTECTED = Fixtures.replaced(Fixtures.replaced(EXPOSED, " #! diode-reverse", ""), "case \"12 V", "diode D2 (anode: gnd, cathode: a) { rated reverse 100 V }\ncase \"12 V");

	@Test
	void triggersOnTheExposedLed() {
		DesignResult r = Fixtures.check(EXPOSED);
		assertEquals(Fixtures.expected(EXPOSED, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		// nothing conducts in reverse but the LED's saturation current: it takes the 12 V [closed form]
		assertEquals(12, f.value(), 1e-6);
		assertEquals("12 V reversed", f.caseName());
	}

	@Test
	void silentWithAnAntiparallelDiode() {
		DesignResult r = Fixtures.check(PROTECTED);
		assertEquals(Fixtures.expected(PROTECTED, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
