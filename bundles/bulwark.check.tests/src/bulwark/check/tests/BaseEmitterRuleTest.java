package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.BaseEmitterRule;
import bulwark.check.finding.RuleId;

class BaseEmitterRuleTest {
	private static final RuleId ID = BaseEmitterRule.ID;

	/**
	 * A transistor whose emitter goes to the probe tip through 10 kΩ: 12 V on the tip reverse-biases the
	 * base–emitter junction into breakdown (about 6 V in the model), over the assumed 5 V.
	 */
	private static final String EXPOSED = """
			design "emitter on the tip"
			reference net gnd
			net tip
			net e
			net c
			terminal TIP at tip
			terminal COM at gnd common
			resistor RE (a: tip, b: e) { value 10 kΩ rated power 250 mW }
			resistor RC (a: c, b: gnd) { value 10 kΩ rated power 250 mW }
			npn Q1 (collector: c, base: gnd, emitter: e) #! base-emitter-reverse
			case "12 V on the tip" { apply 12 V from TIP to COM }
			""";

	/** A diode from the reference to the emitter keeps the junction to one forward drop. */
	private static final String PROTECTED = Fixtures.replaced(Fixtures.replaced(EXPOSED, " #! base-emitter-reverse", ""), "case \"12 V", "diode D1 (anode: e, cathode: gnd) { rated reverse 100 V }\ncase \"12 V");

	@Test
	void triggersAndSaysTheRatingIsAssumed() {
		DesignResult r = Fixtures.check(EXPOSED);
		assertEquals(Fixtures.expected(EXPOSED, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertTrue(f.value() > 5.9 && f.value() < 6.3, "reverse base-emitter voltage " + f.value());
		assertTrue(f.message().contains("the assumed small-signal 5 V"), f.message());
	}

	@Test
	void silentWhenClamped() {
		DesignResult r = Fixtures.check(PROTECTED);
		assertEquals(Fixtures.expected(PROTECTED, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
