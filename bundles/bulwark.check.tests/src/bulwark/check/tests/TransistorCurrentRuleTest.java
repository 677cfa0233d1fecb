package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.cases.PartStress;
import bulwark.check.rules.TransistorCurrentRule;
import bulwark.check.finding.RuleId;

class TransistorCurrentRuleTest {
	private static final RuleId ID = TransistorCurrentRule.ID;

	/** A saturated transistor with 10 Ω from 5 V in its collector: nearly 0.5 A, over its rated 100 mA. */
	private static final String OVER = """
			design "transistor over its current"
			reference net gnd
			net bus
			net c
			net b
			source V1 (plus: bus, minus: gnd) { voltage 5 V }
			resistor RC (a: bus, b: c) { value 10 Ω rated power 5 W package 2512 }
			resistor RB (a: bus, b: b) { value 1 kΩ rated power 250 mW package 0805 }
			npn Q1 (collector: c, base: b, emitter: gnd) { rated collector 100 mA } #! transistor-current
			""";

	@Test
	void triggersOnASaturatedSwitch() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		// the collector current is RC's current [Kirchhoff's current law]
		PartStress rc = r.cases().get(0).parts().stream().filter(p -> p.part().equals("RC")).findFirst().orElseThrow();
		assertEquals(Math.abs(rc.current()), f.value(), 1e-9);
		assertEquals(0.1, f.limit(), 0);
	}

	@Test
	void silentWithALargerCollectorResistor() {
		String within = Fixtures.replaced(Fixtures.replaced(OVER, "value 10 Ω", "value 1 kΩ"), " #! transistor-current", "");
		DesignResult r = Fixtures.check(within);
		assertEquals(Fixtures.expected(within, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
