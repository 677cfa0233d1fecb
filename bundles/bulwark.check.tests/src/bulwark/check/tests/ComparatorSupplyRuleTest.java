package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.ComparatorSupplyRule;

class ComparatorSupplyRuleTest {
	private static final RuleId ID = ComparatorSupplyRule.ID;

	/**
	 * A comparator fed from the tip through 100 Ω: what it and its 200 kΩ divider draw (well under a
	 * milliampere) drops under 0.1 V there, so 12 V on the tip puts nearly 12 V across a 6 V supply [closed form].
	 */
	private static final String FED_FROM_THE_TIP = """
			design "supply from the tip"
			reference net gnd
			net tip
			net vcc
			net ref
			net out
			terminal TIP at tip
			terminal COM at gnd common
			resistor RS (a: tip, b: vcc) { value 100 Ω package 2512 rated power 10 W }
			resistor RA (a: vcc, b: ref) { value 100 kΩ package 1206 rated power 250 mW }
			resistor RB (a: ref, b: gnd) { value 100 kΩ package 1206 rated power 250 mW }
			resistor RL (a: out, b: gnd) { value 100 kΩ package 1206 rated power 250 mW }
			comparator U1 (in_plus: ref, in_minus: gnd, out: out, supply_plus: vcc, supply_minus: gnd) { rated supply 6 V } #! comparator-supply
			case "12 V on the tip" { apply 12 V from TIP to COM }
			""";

	/** A 5.1 V zener across the supply, fed through RS: (12 − 5.1) V / 100 Ω = 69 mA, 0.35 W in it. */
	private static final String REGULATED = Fixtures.replaced(Fixtures.replaced(FED_FROM_THE_TIP, " #! comparator-supply", ""),
			"case \"12 V", "zener Z1 (anode: gnd, cathode: vcc) { breakdown 5.1 V rated power 1 W rated forward 1 A }\ncase \"12 V");

	@Test
	void triggersOnTheSupplyVoltage() {
		DesignResult r = Fixtures.check(FED_FROM_THE_TIP);
		assertEquals(Fixtures.expected(FED_FROM_THE_TIP, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertTrue(f.value() > 11.9 && f.value() < 12, "supply " + f.value());
		assertEquals(6, f.limit(), 0);
	}

	@Test
	void silentWhenRegulated() {
		Fixtures.assertSilent(Fixtures.check(REGULATED), ID);
	}
}
