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

	/**
	 * A follower buffers the tip into a non-inverting Schmitt trigger: R1 = 10 kΩ from the buffer, R2 = 100 kΩ
	 * from the output back to in_plus, in_minus at 2.5 V, rails 0–5 V. The buffer's output is a stiff
	 * source, so when the output swings 5 V the input steps by 5 V·R1/(R1 + R2) = 0.4545 V, and the thresholds
	 * are 2.5 V·(1 + R1/R2) = 2.75 V and 2.75 V − 5 V·R1/R2 = 2.25 V at the buffer [closed form, the
	 * non-inverting Schmitt trigger of docs/sources.md#solver-oracles].
	 */
	static final String BUFFERED = """
			design "buffered Schmitt input"
			reference net gnd
			net vcc
			net tip
			net vin
			net plus
			net ref
			net out
			terminal TIP at tip
			terminal COM at gnd common
			source V1 (plus: vcc, minus: gnd) { voltage 5 V }
			resistor R_PULL (a: vcc, b: tip) { value 10 kΩ rated power 250 mW package 0805 }
			comparator U_BUF (in_plus: tip, in_minus: vin, out: vin, supply_plus: vcc, supply_minus: gnd)
			resistor R1 (a: vin, b: plus) { value 10 kΩ rated power 250 mW package 0805 }
			resistor R2 (a: out, b: plus) { value 100 kΩ rated power 250 mW package 0805 }
			resistor R_TOP (a: vcc, b: ref) { value 100 kΩ rated power 250 mW package 0805 }
			resistor R_BOT (a: ref, b: gnd) { value 100 kΩ rated power 250 mW package 0805 }
			comparator U1 (in_plus: plus, in_minus: ref, out: out, supply_plus: vcc, supply_minus: gnd)
			""";

	@Test
	void aBufferedInputStepsByTheFeedbackDivider() {
		var strict = Fixtures.policy("""
				policy "strict"
				  mains none
				  minimum hysteresis 1 V
				""");
		DesignResult r = Fixtures.check(BUFFERED, strict);
		Finding f = r.findings().stream().filter(x -> x.rule().equals(ID) && "U1".equals(x.part())).findFirst()
				.orElseThrow(() -> new AssertionError("no hysteresis finding for U1: " + r.findings()));
		// 0.4545 V less what the comparator's finite gain (1e5) and 50 Ω output take: within 1 %
		assertEquals(5.0 * 10 / 110, f.value(), 0.01 * 5.0 * 10 / 110);
	}
}
