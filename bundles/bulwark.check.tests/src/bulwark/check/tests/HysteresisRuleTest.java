package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.rules.HysteresisRule;
import bulwark.check.finding.RuleId;

class HysteresisRuleTest {
	private static final RuleId ID = HysteresisRule.ID;

	/**
	 * A continuity input: 10 kΩ pull-up from a 3 V cell to the tip, the tip through R1 = 100 kΩ to the
	 * comparator's in_plus, R2 = 1 MΩ from its output back to in_plus, in_minus at 1.5 V from a divider.
	 * When the output switches from 0 to 3 V, in_plus steps by VOH·R1'/(R1' + R2), R1' being R1 plus the
	 * source resistance of the tip (the pull-up parallel to the resistance under test) [closed form, divider;
	 * the non-inverting network of docs/sources.md#solver-oracles].
	 */
	static final String SCHMITT = """
			design "continuity input"
			reference net gnd
			net vbat
			net tip
			net plus
			net ref
			net out
			terminal TIP at tip
			terminal COM at gnd common
			battery B1 (plus: vbat, minus: gnd) { emf 3 V }
			resistor R_PULL (a: vbat, b: tip) { value 10 kΩ rated power 250 mW package 0805 }
			resistor R1 (a: tip, b: plus) { value 100 kΩ rated power 250 mW package 0805 }
			resistor R2 (a: out, b: plus) { value 1 MΩ rated power 250 mW package 0805 }
			resistor R_TOP (a: vbat, b: ref) { value 100 kΩ rated power 250 mW package 0805 }
			resistor R_BOT (a: ref, b: gnd) { value 100 kΩ rated power 250 mW package 0805 }
			comparator U1 (in_plus: plus, in_minus: ref, out: out, supply_plus: vbat, supply_minus: gnd) #! hysteresis
			""";

	@Test
	void triggersBelowThePolicyMinimum() {
		var strict = Fixtures.policy("""
				policy "strict"
				  mains none
				  minimum hysteresis 500 mV
				""");
		DesignResult r = Fixtures.check(SCHMITT, strict);
		assertEquals(Fixtures.expected(SCHMITT, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(Severity.WARNING, f.severity());
		assertEquals(0.5, f.limit(), 0);
		// at the rising threshold the tip's source resistance is 10 kΩ ∥ Rx; the message gives Rx
		double step = f.value();
		assertTrue(step > 3 * 100e3 / 1.1e6 * 0.99 && step < 3 * 110e3 / 1.11e6 * 1.01, "step " + step);
		assertTrue(f.message().contains("between TIP and COM"), f.message());
	}

	@Test
	void triggersWithoutFeedback() {
		String open = Fixtures.replaced(SCHMITT, "resistor R2 (a: out, b: plus) { value 1 MΩ rated power 250 mW package 0805 }\n", "");
		DesignResult r = Fixtures.check(open);
		assertEquals(Fixtures.expected(open, ID), Fixtures.actual(r, ID));
		assertTrue(Fixtures.only(r, ID).message().contains("no positive feedback"), Fixtures.only(r, ID).message());
	}

	@Test
	void silentAboveTheBuiltInMinimum() {
		String quiet = Fixtures.replaced(SCHMITT, " #! hysteresis", "");
		DesignResult r = Fixtures.check(quiet);
		assertEquals(Fixtures.expected(quiet, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
