package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.rules.PreferredValueRule;
import bulwark.check.series.Iec60063;
import bulwark.check.finding.RuleId;

class PreferredValueRuleTest {
	private static final RuleId ID = PreferredValueRule.ID;

	/** 333 kΩ ± 5 % is no E24 value; 330 kΩ is [IEC 60063 E24, docs/sources.md#preferred-values]. */
	private static final String COMPUTED = """
			design "computed value"
			reference net gnd
			net a
			source V1 (plus: a, minus: gnd) { voltage 5 V }
			resistor R1 (a: a, b: gnd) { value 333 kΩ ± 5 % package 0805 rated power 125 mW } #! preferred-value
			resistor R2 (a: a, b: gnd) { value 47 kΩ ± 1 % package 0805 rated power 125 mW }
			resistor R3 (a: a, b: gnd) { value 48.7 kΩ ± 1 % package 0805 rated power 125 mW }
			""";

	@Test
	void triggersOnAValueOutsideItsSeries() {
		DesignResult r = Fixtures.check(COMPUTED);
		assertEquals(Fixtures.expected(COMPUTED, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(Severity.INFO, f.severity());
		assertEquals(330e3, f.limit(), 1e-6);
		assertTrue(f.message().contains("not a value of E24"), f.message());
	}

	@Test
	void silentOnStockValues() {
		// 47 kΩ ± 1 % is E24 (coarser than E96, and stocked in 1 %); 48.7 kΩ is E96 [IEC 60063]
		String stock = Fixtures.replaced(Fixtures.replaced(COMPUTED, "333 kΩ", "330 kΩ"), " #! preferred-value", "");
		DesignResult r = Fixtures.check(stock);
		assertEquals(Fixtures.expected(stock, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
		assertTrue(Iec60063.stocked(48.7e3, 1) && !Iec60063.stocked(48.7e3, 5));
	}
}
