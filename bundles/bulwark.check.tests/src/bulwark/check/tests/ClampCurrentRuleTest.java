package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.rules.ClampCurrentRule;
import bulwark.check.finding.RuleId;

class ClampCurrentRuleTest {
	private static final RuleId ID = ClampCurrentRule.ID;

	/**
	 * The comparator of {@link ComparatorInputRuleTest} with 1 kΩ instead of 100 kΩ at its input and 325 V
	 * on the tip: about (325 − 5.5)/1 kΩ = 320 mA through the clamp, over the assumed 10 mA.
	 */
	private static final String EXPOSED = Fixtures.replaced(Fixtures.replaced(Fixtures.replaced(ComparatorInputRuleTest.EXPOSED, "value 100 kΩ rated power 250 mW", "value 1 kΩ rated power 250 mW"), "apply 24 V", "apply 325 V"), " #! comparator-input", " #! comparator-input #! clamp-current");

	@Test
	void triggersAtMainsPeak() {
		DesignResult r = Fixtures.check(EXPOSED);
		assertEquals(Fixtures.expected(EXPOSED, ID), Fixtures.actual(r, ID));
		double amps = Fixtures.only(r, ID).value();
		// the clamp current is the resistor's: (325 − V(inp))/1 kΩ, with V(inp) a junction above 5 V [closed form]
		assertEquals((325 - 5.5) / 1e3, amps, 0.01);
	}

	@Test
	void silentWithAMegohmInFront() {
		String limited = Fixtures.replaced(Fixtures.replaced(EXPOSED, "value 1 kΩ rated power 250 mW", "value 1 MΩ rated power 250 mW"), " #! clamp-current", "");
		DesignResult r = Fixtures.check(limited);
		assertEquals(Fixtures.expected(limited, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
