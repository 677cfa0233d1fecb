package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.rules.Figures;

/** Engineering notation in messages: three significant figures, SI prefixes (BIPM SI brochure, table 7). */
class FiguresTest {
	@Test
	void prefixes() {
		assertEquals("346 mW", Figures.engineering(0.3456, "W"));
		assertEquals("125 mW", Figures.engineering(0.125, "W"));
		assertEquals("2 W", Figures.engineering(2, "W"));
		assertEquals("1 kV", Figures.engineering(999.96, "V")); // rounds up into the next prefix
		assertEquals("4.53 pA", Figures.engineering(4.53e-12, "A"));
		assertEquals("20 fA", Figures.engineering(2e-14, "A"));
		assertEquals("-7.96 pA", Figures.engineering(-7.96e-12, "A"));
		assertEquals("0 W", Figures.engineering(0, "W"));
		assertEquals("5.14e-19 W", Figures.engineering(5.14e-19, "W"));
		assertEquals("3.58 GΩ", Figures.engineering(3.58e9, "Ω"));
	}
}
