package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.InputRangeRule;
import bulwark.check.finding.RuleId;

class InputRangeRuleTest {
	private static final RuleId ID = InputRangeRule.ID;

	/**
	 * A 5 V comparator whose inputs work up to 1.5 V below its supply (3.5 V); in_minus sits on a divider of
	 * 10 kΩ over 40 kΩ from 5 V: 4 V [closed form, divider], 0.5 V too high.
	 */
	static final String HIGH = """
			design "reference too near the rail"
			reference net gnd
			net v5
			net ref
			net sig
			net out
			source V1 (plus: v5, minus: gnd) { voltage 5 V }
			resistor R1 (a: v5, b: ref) { value 10 kΩ package 0805 rated power 125 mW }
			resistor R2 (a: ref, b: gnd) { value 40 kΩ package 0805 rated power 125 mW }
			resistor R3 (a: v5, b: sig) { value 100 kΩ package 0805 rated power 125 mW }
			resistor R4 (a: sig, b: gnd) { value 100 kΩ package 0805 rated power 125 mW }
			resistor R5 (a: out, b: gnd) { value 100 kΩ package 0805 rated power 125 mW }
			comparator U1 (in_plus: sig, in_minus: ref, out: out, supply_plus: v5, supply_minus: gnd) { #! input-range
			  rated headroom 1.5 V
			}
			""";

	@Test
	void triggersWhenAnInputIsAboveItsWorkingRange() {
		DesignResult r = Fixtures.check(HIGH);
		assertEquals(Fixtures.expected(HIGH, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(5.0 * 40 / 50 - 3.5, f.value(), 1e-6);
		assertTrue(f.message().contains("in_minus is at 4 V"), f.message());
	}

	@Test
	void silentWithinTheRange() {
		String within = Fixtures.replaced(Fixtures.replaced(HIGH, "value 10 kΩ", "value 40 kΩ"), " #! input-range", ""); // 2.5 V
		DesignResult r = Fixtures.check(within);
		assertEquals(Fixtures.expected(within, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
