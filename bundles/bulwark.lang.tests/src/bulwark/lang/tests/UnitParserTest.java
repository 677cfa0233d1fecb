package bulwark.lang.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.lang.units.Quantities;
import bulwark.lang.units.ScaledUnit;
import bulwark.lang.units.Unit;
import bulwark.lang.units.UnitParser;

/** SI prefixes and unit symbols (BIPM, The International System of Units, 9th ed., 2019, tables 4 and 7). */
class UnitParserTest {

	private static void assertUnit(String text, Unit unit, double factor) {
		ScaledUnit u = UnitParser.parse(text).orElseThrow(() -> new AssertionError("not parsed: " + text));
		assertEquals(unit, u.unit(), text);
		assertEquals(factor, u.factor(), factor * 1e-15, text);
	}

	@Test
	void prefixesAndSymbols() {
		assertUnit("Ω", Unit.OHM, 1);
		assertUnit("kohm", Unit.OHM, 1e3);
		assertUnit("MΩ", Unit.OHM, 1e6);
		assertUnit("mΩ", Unit.OHM, 1e-3);
		assertUnit("mW", Unit.WATT, 1e-3);
		assertUnit("µA", Unit.AMPERE, 1e-6);
		assertUnit("μA", Unit.AMPERE, 1e-6); // Greek mu as well as the micro sign
		assertUnit("uF", Unit.FARAD, 1e-6);
		assertUnit("pF", Unit.FARAD, 1e-12);
		assertUnit("mAh", Unit.AMPERE_HOUR, 3.6); // to coulombs: 1 mAh = 1e-3 A · 3600 s [SI brochure, table 8]
		assertUnit("h", Unit.HOUR, 3600);
		assertUnit("Hz", Unit.HERTZ, 1); // not H with a prefix
		assertUnit("kHz", Unit.HERTZ, 1e3);
		assertUnit("ms", Unit.SECOND, 1e-3);
		assertUnit("TΩ", Unit.OHM, 1e12);
		assertUnit("fA", Unit.AMPERE, 1e-15); // a junction's saturation current
		assertUnit("aA", Unit.AMPERE, 1e-18);
	}

	/** Values go to SI through the JSR 385 implementation, once, when the design is read. */
	@Test
	void valuesToSiThroughTheUnitsLibrary() {
		assertEquals(4700, Quantities.toSi(4.7, UnitParser.parse("kΩ").orElseThrow()), 1e-9);
		// a CR2032's 225 mAh [docs/sources.md#batteries] is 810 C; a year of 8766 h is 31 557 600 s [closed form]
		assertEquals(810, Quantities.toSi(225, UnitParser.parse("mAh").orElseThrow()), 1e-9);
		assertEquals(31_557_600, Quantities.toSi(8766, UnitParser.parse("h").orElseThrow()), 1e-6);
		assertEquals(2.2e-11, Quantities.toSi(22, UnitParser.parse("pF").orElseThrow()), 1e-24);
		assertTrue(Unit.HOUR.sameQuantity(Unit.SECOND));
		assertTrue(!Unit.AMPERE_HOUR.sameQuantity(Unit.AMPERE));
	}

	@Test
	void notUnits() {
		assertTrue(UnitParser.parse("k").isEmpty());
		assertTrue(UnitParser.isBarePrefix("k"));
		assertTrue(UnitParser.parse("kk").isEmpty());
		assertTrue(UnitParser.parse("volt").isEmpty());
		assertTrue(UnitParser.parse("").isEmpty());
	}
}
