package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.finding.Concern;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.SeriesStringRule;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.ResistorVoltageRule;

class SeriesStringRuleTest {
	private static final RuleId ID = SeriesStringRule.ID;

	/**
	 * 357.8 V (253 V + 10 % peak, docs/sources.md#mains-and-surges) across a string of 1 MΩ, 1.2 MΩ and 100 kΩ 0805 resistors: one
	 * current, so the shares follow the values [closed form, voltage divider]: R2 takes 357.8·1.2/2.3 = 186.7 V
	 * and R1 155.6 V, both over the 150 V limiting element voltage of 0805 [common practice, docs/sources.md#resistor-voltage];
	 * the finding is on R2, the worst, and says the sharing is unequal.
	 */
	static final String STRING = """
			design "series string"
			reference net gnd
			net tip
			net mid
			net sense
			terminal TIP at tip
			terminal COM at gnd common
			resistor R1 (a: tip, b: mid) { value 1 MΩ package 0805 rated power 125 mW }
			resistor R2 (a: mid, b: sense) { value 1.2 MΩ package 0805 rated power 125 mW } #! series-string
			resistor R3 (a: sense, b: gnd) { value 100 kΩ package 0805 rated power 125 mW }
			case "mains peak" { apply 357.8 V from TIP to COM }
			""";

	@Test
	void triggersOnTheWorstMemberOfTheString() {
		DesignResult r = Fixtures.check(STRING);
		assertEquals(Fixtures.expected(STRING, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(357.8 * 1.2 / 2.3, f.value(), 1e-9);
		assertEquals(150, f.limit(), 0);
		assertEquals(Concern.SERIES_STRING, f.concern());
		assertTrue(f.message().startsWith("series string R1–R2–R3 carries 358 V in case 'mains peak'; R2 takes 187 V"), f.message());
		assertTrue(f.message().contains("unequal (R1 43 %, R2 52 %, R3 4 %)"), f.message());
		// the members are the string's business: resistor-voltage stays silent about them
		Fixtures.assertSilent(r, ResistorVoltageRule.ID);
	}

	/**
	 * A 0 Ω link between R1 and R2 joins their nets into one: the string is still R1–R2–R3, and R2 still
	 * takes its share; the link's 10 mΩ changes the division by parts in 10⁸ [closed form].
	 */
	@Test
	void aLinkInTheStringKeepsItOneString() {
		String linked = Fixtures.replaced(STRING, "resistor R1 (a: tip, b: mid)", "net mid2\nlink J1 (a: mid, b: mid2) { rated current 1 A }\n"
				+ "resistor R1 (a: tip, b: mid2)");
		DesignResult r = Fixtures.check(linked);
		Finding f = Fixtures.only(r, ID);
		assertEquals(357.8 * 1.2 / 2.3, f.value(), 1e-4);
		assertTrue(f.message().startsWith("series string R1–R2–R3 carries 358 V"), f.message());
	}

	@Test
	void silentWhenEveryShareIsWithinItsRating() {
		String bigger = Fixtures.replaced(Fixtures.replaced(STRING, "package 0805", "package 1206"), " #! series-string", "");
		DesignResult r = Fixtures.check(bigger);
		assertEquals(Fixtures.expected(bigger, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}
}
