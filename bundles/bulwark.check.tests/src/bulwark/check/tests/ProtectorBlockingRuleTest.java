package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.cases.PartStress;
import bulwark.check.rules.ProtectorBlockingRule;
import bulwark.check.finding.RuleId;

class ProtectorBlockingRuleTest {
	private static final RuleId ID = ProtectorBlockingRule.ID;

	/**
	 * A protector tripping at 20 mA in series with 1 kΩ: at 357.8 V it limits, and holds off what the
	 * resistor does not take, 357.8 − 1 kΩ·I [Kirchhoff's voltage law], about 338 V, over its 250 V.
	 */
	private static final String OVER = """
			design "protector over its blocking voltage"
			reference net gnd
			net tip
			net sense
			terminal TIP at tip
			terminal COM at gnd common
			protector P1 (a: tip, b: sense) { resistance 10 Ω trip 20 mA rated blocking 250 V } #! protector-blocking
			resistor R1 (a: sense, b: gnd) { value 1 kΩ rated power 1 W package 2512 }
			case "mains peak" { apply 357.8 V from TIP to COM }
			""";

	@Test
	void triggersWhenTheTrippedProtectorHoldsOffTooMuch() {
		DesignResult r = Fixtures.check(OVER);
		assertEquals(Fixtures.expected(OVER, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		PartStress r1 = r.cases().stream().filter(c -> c.name().equals("mains peak")).findFirst().orElseThrow().parts()
				.stream().filter(p -> p.part().equals("R1")).findFirst().orElseThrow();
		assertEquals(357.8 - r1.voltage(), f.value(), 1e-6);
		assertEquals(250, f.limit(), 0);
	}

	@Test
	void silentWithAMainsRatedProtector() {
		String within = Fixtures.replaced(OVER, "rated blocking 250 V } #! protector-blocking", "rated blocking 600 V }");
		DesignResult r = Fixtures.check(within);
		assertEquals(Fixtures.expected(within, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
