package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.Concern;
import bulwark.check.DesignResult;
import bulwark.check.Finding;
import bulwark.check.rules.ResistorVoltageRule;

class ResistorVoltageRuleTest {
	private static final String ID = ResistorVoltageRule.ID;

	/**
	 * 357.8 V (253 V + 10 % peak, sources.md) across a string of two 1 MΩ 0805 resistors and a 100 kΩ sense
	 * resistor: each 1 MΩ part takes 357.8·1/2.1 = 170.4 V, over the 150 V limiting element voltage of 0805
	 * [common practice, sources.md]; its power, 29 mW, is far within 125 mW, so only the voltage shows it.
	 */
	private static final String STRING = """
			design "series string"
			reference net gnd
			net tip
			net mid
			net sense
			terminal TIP at tip
			terminal COM at gnd common
			resistor R1 (a: tip, b: mid) { #! resistor-voltage
			  value 1 MΩ
			  package 0805
			  rated power 125 mW
			}
			resistor R2 (a: mid, b: sense) { value 1 MΩ package 0805 rated power 125 mW } #! resistor-voltage
			resistor R3 (a: sense, b: gnd) { value 100 kΩ package 0805 rated power 125 mW }
			case "mains peak" { apply 357.8 V from TIP to COM }
			""";

	@Test
	void triggersOnEachOverstressedResistorOfTheString() {
		DesignResult r = Fixtures.check(STRING);
		assertEquals(Fixtures.expected(STRING, ID), Fixtures.actual(r, ID));
		Finding f = r.findings().stream().filter(x -> x.rule().equals(ID) && x.part().equals("R1")).findFirst()
				.orElseThrow();
		assertEquals(357.8 / 2.1, f.value(), 1e-9);
		assertEquals(150, f.limit(), 0);
		assertEquals(Concern.SERIES_STRING, f.concern());
		assertTrue(f.message().contains("limiting element voltage of a 0805 part"), f.message());
		assertTrue(Fixtures.actual(r, "resistor-power").isEmpty(), "power is within rating");
	}

	@Test
	void silentWithALargerPackage() {
		String bigger = STRING.replace("package 0805", "package 1206").replace(" #! resistor-voltage", "");
		DesignResult r = Fixtures.check(bigger);
		assertEquals(Fixtures.expected(bigger, ID), Fixtures.actual(r, ID));
		assertTrue(Fixtures.actual(r, ID).isEmpty());
	}
}
