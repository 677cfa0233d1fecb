package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.cases.PartStress;
import bulwark.check.rules.ForwardCurrentRule;
import bulwark.check.finding.RuleId;

class ForwardCurrentRuleTest {
	private static final RuleId ID = ForwardCurrentRule.ID;

	/** A red LED from 12 V through 220 Ω: about (12 − 1.9)/220 = 46 mA, over its rated 30 mA. */
	private static final String OVER = """
			design "LED over its current"
			reference net gnd
			net bus
			net a
			source V1 (plus: bus, minus: gnd) { voltage 12 V }
			resistor R1 (a: bus, b: a) { value 220 Ω rated power 1 W package 1206 }
			led D1 (anode: a, cathode: gnd) { colour red rated forward 30 mA rated reverse 5 V } #! forward-current
			""";

	@Test
	void triggersOnAnLedOverItsCurrent() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		// one current through R1 and D1 [Kirchhoff's current law]: the LED's current is R1's voltage over 220 Ω
		PartStress r1 = r.cases().get(0).parts().stream().filter(p -> p.part().equals("R1")).findFirst().orElseThrow();
		assertEquals(r1.voltage() / 220, f.value(), 1e-12);
		assertTrue(f.value() > 0.044 && f.value() < 0.048, "red LED forward voltage 1.63–2.03 V [docs/sources.md#leds]: " + f.value());
		assertEquals(0.030, f.limit(), 0);
	}

	@Test
	void silentWithEnoughSeriesResistance() {
		String within = Fixtures.replaced(Fixtures.replaced(OVER, "value 220 Ω", "value 1 kΩ"), " #! forward-current", "");
		DesignResult r = Fixtures.check(within);
		assertEquals(Fixtures.expected(within, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
