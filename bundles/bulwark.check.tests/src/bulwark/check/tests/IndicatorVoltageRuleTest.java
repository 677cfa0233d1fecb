package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.IndicatorVoltageRule;

class IndicatorVoltageRuleTest {
	private static final RuleId ID = IndicatorVoltageRule.ID;

	/** A 60 V lamp straight across the terminals meets the 325 V crest of 230 V mains [closed form: 230·√2]. */
	private static final String ACROSS = """
			design "lamp across the terminals"
			reference net gnd
			net tip
			terminal TIP at tip
			terminal COM at gnd common
			indicator L1 (a: tip, b: gnd) { resistance 10 kΩ rated voltage 60 V rated power 20 W } #! indicator-voltage
			case "mains crest on the tip" { apply 325 V from TIP to COM }
			""";

	/** At 48 V it is within its rating. */
	private static final String WITHIN = Fixtures.replaced(Fixtures.replaced(ACROSS, " #! indicator-voltage", ""),
			"apply 325 V", "apply 48 V");

	@Test
	void triggersOnTheVoltageAcrossIt() {
		DesignResult r = Fixtures.check(ACROSS);
		assertEquals(Fixtures.expected(ACROSS, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(325, f.value(), 1e-9);
		assertEquals(60, f.limit(), 0);
	}

	@Test
	void silentWithinItsRating() {
		Fixtures.assertSilent(Fixtures.check(WITHIN), ID);
	}
}
