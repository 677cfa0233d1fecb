package bulwark.lang.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

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
		assertUnit("mAh", Unit.AMPERE_HOUR, 1e-3);
		assertUnit("Hz", Unit.HERTZ, 1); // not H with a prefix
		assertUnit("kHz", Unit.HERTZ, 1e3);
		assertUnit("ms", Unit.SECOND, 1e-3);
		assertUnit("TΩ", Unit.OHM, 1e12);
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
