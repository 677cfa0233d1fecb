package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.finding.Concern;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.rules.ReversePathRule;
import bulwark.check.finding.RuleId;

class ReversePathRuleTest {
	private static final RuleId ID = ReversePathRule.ID;
	/** A policy that applies 24 V both ways across every pair of terminals, and no mains. */
	private static final ReviewPolicy BOTH_WAYS = Fixtures.policy("""
			policy "24 V both ways"
			  mains none
			  level 24 V
			""");

	/**
	 * An LED behind 1 kΩ from the tip. With COM positive the LED's cathode is at +24 V and its anode reaches the
	 * tip through R1, which blocks nothing: 24 V of reverse voltage against its rated 5 V derated to 70 %
	 * (NASA EEE-INST-002 level, unconfirmed) — 3.5 V.
	 */
	static final String EXPOSED = """
			design "LED on the tip"
			reference net gnd
			net tip
			net a
			terminal TIP at tip
			terminal COM at gnd common
			resistor R1 (a: tip, b: a) { value 1 kΩ rated power 1 W package 0805 }
			led D1 (anode: a, cathode: gnd) { colour red rated reverse 5 V rated forward 50 mA } #! reverse-path
			""";

	@Test
	void triggersWithThePathFromTerminalToTerminal() {
		DesignResult r = Fixtures.check(EXPOSED, BOTH_WAYS);
		assertEquals(Fixtures.expected(EXPOSED, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(Concern.REVERSE_PATH, f.concern());
		assertEquals("24 V DC, COM + to TIP −", f.caseName());
		assertTrue(f.message().contains("COM → D1 → net a → R1 → TIP"), f.message());
		assertEquals(java.util.List.of("COM", "D1", "net a", "R1", "TIP"), ReversePathRule.pathOf(f));
		assertEquals(24, f.value(), 1e-6); // nothing flows, so R1 drops nothing [closed form]
		assertEquals(5 * 0.7, f.limit(), 1e-12);
	}

	@Test
	void silentBehindABlockingDiodeWhoseRatingHolds() {
		String blocked = Fixtures.replaced(Fixtures.replaced(EXPOSED, "resistor R1 (a: tip, b: a)",
				"net b\ndiode D3 (anode: tip, cathode: b) { rated reverse 400 V rated forward 1 A }\nresistor R1 (a: b, b: a)"),
				" #! reverse-path", "");
		DesignResult r = Fixtures.check(blocked, BOTH_WAYS);
		assertEquals(Fixtures.expected(blocked, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
