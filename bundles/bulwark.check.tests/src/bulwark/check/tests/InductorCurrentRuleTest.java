package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.InductorCurrentRule;

class InductorCurrentRuleTest {
	private static final RuleId ID = InductorCurrentRule.ID;

	/** A choke in series with 100 Ω: a short at DC, so 24 V drive 24 V / 100 Ω = 240 mA, over its 100 mA [closed form]. */
	private static final String OVER = """
			design "choke on the tip"
			reference net gnd
			net tip
			net mid
			terminal TIP at tip
			terminal COM at gnd common
			inductor L1 (a: tip, b: mid) { value 1 mH rated current 100 mA } #! inductor-current
			resistor R1 (a: mid, b: gnd) { value 100 Ω package 2512 rated power 10 W }
			case "24 V on the tip" { apply 24 V from TIP to COM }
			""";

	/** Behind 1 kΩ it carries 24 mA. */
	private static final String WITHIN = Fixtures.replaced(Fixtures.replaced(OVER, " #! inductor-current", ""),
			"value 100 Ω", "value 1 kΩ");

	@Test
	void triggersOnTheDcCurrent() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(0.24, f.value(), 1e-6);
		assertEquals(0.1, f.limit(), 0);
	}

	@Test
	void silentWithinItsRating() {
		Fixtures.assertSilent(Fixtures.check(WITHIN), ID);
	}
}
