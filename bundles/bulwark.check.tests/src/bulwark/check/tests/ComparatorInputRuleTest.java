package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.rules.ComparatorInputRule;

class ComparatorInputRuleTest {
	private static final String ID = ComparatorInputRule.ID;

	/**
	 * 24 V on the probe tip into in+ through 100 kΩ; the input clamps to the 5 V rail about 0.5 V above it
	 * (a silicon junction at ~0.2 mA), over the assumed 0.3 V CMOS margin.
	 */
	static final String EXPOSED = """
			design "comparator on the tip"
			reference net gnd
			net vcc
			net tip
			net inp
			net ref
			net out
			terminal TIP at tip
			terminal COM at gnd common
			source VCC (plus: vcc, minus: gnd) { voltage 5 V resistance 1 Ω }
			source VREF (plus: ref, minus: gnd) { voltage 2.5 V }
			resistor RIN (a: tip, b: inp) { value 100 kΩ rated power 250 mW }
			resistor RL (a: out, b: gnd) { value 10 kΩ rated power 125 mW }
			comparator U1 (in_plus: inp, in_minus: ref, out: out, supply_plus: vcc, supply_minus: gnd) #! comparator-input
			case "24 V on the tip" { apply 24 V from TIP to COM }
			""";

	@Test
	void triggersWhenTheInputClampsToItsRail() {
		DesignResult r = Fixtures.checkAllowingTrouble(EXPOSED);
		assertEquals(Fixtures.expected(EXPOSED, ID), Fixtures.actual(r, ID));
		double beyond = Fixtures.only(r, ID).value();
		assertTrue(beyond > 0.3 && beyond < 0.8, "input beyond the rail by " + beyond);
	}

	@Test
	@org.junit.jupiter.api.Disabled("the normal case does not solve: the comparator input is held only by clamp leakage (issue 18, item 2)")
	void silentWithinTheRails() {
		String safe = Fixtures.replaced(Fixtures.replaced(EXPOSED, "apply 24 V", "apply 4 V"), " #! comparator-input", "");
		DesignResult r = Fixtures.checkAllowingTrouble(safe);
		assertEquals(Fixtures.expected(safe, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
