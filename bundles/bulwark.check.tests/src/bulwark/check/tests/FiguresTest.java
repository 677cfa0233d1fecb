package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.figures.Figures;

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

	@Test
	void aFigureOverItsLimitNeverReadsEqualToIt() {
		// 10.036 mA against 10 mA: three figures would write both as "10 mA" and the share as "100 %"
		assertEquals("10.04 mA", Figures.over(10.036e-3, 10e-3, "A"));
		assertEquals("100.4", Figures.percentOf(10.036e-3, 10e-3));
		// closer still, more figures; far over, the usual three
		assertEquals("10.0004 mA", Figures.over(10.0004e-3, 10e-3, "A"));
		assertEquals("100.004", Figures.percentOf(10.0004e-3, 10e-3));
		assertEquals("346 mW", Figures.over(0.3456, 0.15, "W"));
		assertEquals("230", Figures.percentOf(0.3456, 0.15));
		// under the limit it reads under: 99.96 % is not "100"
		assertEquals("99.96", Figures.percentOf(0.9996, 1));
	}

	@Test
	void farOverTheLimitTheFactorIsWritten() {
		assertEquals("231 % of the limit", Figures.ofTheLimit(2.31, 1));
		assertEquals("1000 % of the limit", Figures.ofTheLimit(10, 1));
		assertEquals("12.8× the limit", Figures.ofTheLimit(0.96, 0.075));
		// 512 mA into a cell that tolerates 10 µA: not "5116562 %"
		assertEquals("51,200× the limit", Figures.ofTheLimit(0.5116562, 10e-6));
	}
}
