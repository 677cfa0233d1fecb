package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.LinkCurrentRule;

class LinkCurrentRuleTest {
	private static final RuleId ID = LinkCurrentRule.ID;

	/**
	 * A 0 Ω link (10 mΩ) in series with 47 Ω: 24 V drive 24 / 47.01 = 511 mA through it, over its 250 mA
	 * [closed form, Ohm's law].
	 */
	private static final String OVER = """
			design "link in the feed"
			reference net gnd
			net tip
			net mid
			terminal TIP at tip
			terminal COM at gnd common
			link J1 (a: tip, b: mid) { rated current 250 mA } #! link-current
			resistor R1 (a: mid, b: gnd) { value 47 Ω package 2512 rated power 20 W }
			case "24 V on the tip" { apply 24 V from TIP to COM }
			""";

	/** Behind 470 Ω it carries 51 mA. */
	private static final String WITHIN = Fixtures.replaced(Fixtures.replaced(OVER, " #! link-current", ""),
			"value 47 Ω", "value 470 Ω");

	@Test
	void triggersOnItsCurrent() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(24 / 47.01, f.value(), 1e-9);
		assertEquals(0.25, f.limit(), 0);
	}

	@Test
	void silentWithinItsRating() {
		Fixtures.assertSilent(Fixtures.check(WITHIN), ID);
	}

	/** A link fails open only (it is a short already): the single-fault analysis opens it and nothing else. */
	@Test
	void itFailsOpenOnly() {
		var modes = bulwark.check.faults.FailureModes.of(bulwark.lang.design.PartKind.LINK);
		assertEquals(1, modes.size());
		assertTrue(modes.get(0).toString().toLowerCase(java.util.Locale.ROOT).contains("open"), modes.toString());
	}
}
