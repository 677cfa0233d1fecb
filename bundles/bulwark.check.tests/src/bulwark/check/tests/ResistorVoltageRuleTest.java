package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.finding.Concern;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.ResistorVoltageRule;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.ResistorPowerRule;

class ResistorVoltageRuleTest {
	private static final RuleId ID = ResistorVoltageRule.ID;

	/**
	 * 357.8 V (253 V + 10 % peak, docs/sources.md#mains-and-surges) straight across one 1 MΩ 0805 resistor: 357.8 V against the
	 * 150 V limiting element voltage of 0805 [common practice, docs/sources.md#resistor-voltage]; its power, 128 mW, is within its
	 * 250 mW, so only the voltage shows it.
	 */
	private static final String SINGLE = """
			design "one resistor across the terminals"
			reference net gnd
			net tip
			terminal TIP at tip
			terminal COM at gnd common
			resistor R1 (a: tip, b: gnd) { #! resistor-voltage
			  value 1 MΩ
			  package 0805
			  rated power 250 mW
			}
			case "mains peak" { apply 357.8 V from TIP to COM }
			""";

	@Test
	void triggersOnAResistorAcrossTheFault() {
		DesignResult r = Fixtures.check(SINGLE);
		assertEquals(Fixtures.expected(SINGLE, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(357.8, f.value(), 1e-9);
		assertEquals(150, f.limit(), 0);
		assertEquals(Concern.VOLTAGE, f.concern());
		assertTrue(f.message().contains("0805 package's limiting element voltage of 150 V"), f.message());
		Fixtures.assertSilent(r, ResistorPowerRule.ID);
	}

	@Test
	void silentWithAWrittenRating() {
		String bigger = Fixtures.replaced(Fixtures.replaced(SINGLE, "package 0805", "rated voltage 500 V"), " #! resistor-voltage", "");
		DesignResult r = Fixtures.check(bigger);
		assertEquals(Fixtures.expected(bigger, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
