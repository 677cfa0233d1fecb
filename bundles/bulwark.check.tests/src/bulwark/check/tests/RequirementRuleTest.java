package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.finding.Concern;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.rules.RequirementRule;
import bulwark.check.finding.RuleId;

class RequirementRuleTest {
	private static final RuleId ID = RequirementRule.ID;

	/**
	 * A 9 V cell (1.7 Ω) behind 680 Ω to the core, read back through 100 kΩ over 47 kΩ. Open: 9/147 681.7 Ω =
	 * 60.9 µA; 500 mAh (1800 C) lasts 1800/60.9 µA = 8205 h, short of a year (8766 h). Into a short:
	 * 9/681.7 Ω = 13.2 mA [closed form, Ohm's law; capacity / current].
	 */
	private static final String CHECKER = """
			design "loom checker"
			reference net gnd
			net bat
			net probe
			net readback
			terminal CORE at probe
			terminal SCREEN at gnd common
			battery B1 (plus: bat, minus: gnd) { emf 9 V resistance 1.7 Ω capacity 500 mAh }
			resistor R_LIMIT (a: bat, b: probe) { value 680 Ω package 1206 rated power 250 mW }
			resistor R_READ (a: probe, b: readback) { value 100 kΩ package 0805 rated power 125 mW }
			resistor R_LOAD (a: readback, b: gnd) { value 47 kΩ package 0805 rated power 125 mW }
			require battery_life 8766 h #! requirement
			require test_current 10 mA between CORE and SCREEN #! requirement
			""";

	@Test
	void triggersOnEachMissedRequirement() {
		DesignResult r = Fixtures.check(CHECKER);
		assertEquals(Fixtures.expected(CHECKER, ID), Fixtures.actual(r, ID));
		Finding life = r.findings().stream().filter(f -> f.rule().equals(ID) && f.message().startsWith("battery life"))
				.findFirst().orElseThrow();
		double standby = 9 / 147681.7;
		assertEquals(1800 / standby, life.value(), 1e-3);
		assertEquals(8766 * 3600, life.limit(), 1e-6);
		assertEquals(Severity.ERROR, life.severity());
		assertEquals(Concern.REQUIREMENT, life.concern());
		assertTrue(life.message().contains("8205 h"), life.message());
		Finding test = r.findings().stream().filter(f -> f.rule().equals(ID) && f.message().startsWith("test current"))
				.findFirst().orElseThrow();
		// the short is 1 mΩ, and the 147 kΩ read-back across it takes a few parts in 10⁹
		assertEquals(9 / (681.7 + 1e-3), test.value(), 1e-10);
		assertTrue(test.message().startsWith("test current between CORE and SCREEN is 13.2 mA, required at most 10 mA"),
				test.message());
	}

	/**
	 * A voltage indicator: a 1 kΩ lamp, on from 1 mA, behind 9 kΩ across the terminals. It comes on at
	 * 1 mA · 10 kΩ = 10 V either way round, and goes off at the same voltage: a lamp has no hysteresis
	 * [closed form, Ohm's law]. An LED in its place lights one way round only.
	 */
	private static final String VOLTAGE_INDICATOR = """
			design "voltage indicator"
			reference net gnd
			net tip
			net lamp
			terminal TIP at tip
			terminal COM at gnd common
			resistor R_SERIES (a: tip, b: lamp) { value 9 kΩ package 2512 rated power 1 W rated voltage 1 kV }
			indicator L1 (a: lamp, b: gnd) { resistance 1 kΩ activation 1 mA rated power 1 W rated voltage 1 kV }
			""";

	@Test
	void theSwitchOnVoltageOfAVoltageIndicator() {
		DesignResult met = Fixtures.check(VOLTAGE_INDICATOR + "require switch_on_voltage 12 V between TIP and COM\n");
		Fixtures.assertSilent(met, ID);
		var pair = met.function().pairs().get(0);
		assertEquals(10, pair.forward().onVolts(), 10 * 1e-3);
		assertEquals(10, pair.forward().offVolts(), 10 * 1e-3);
		assertEquals(10, pair.reverse().onVolts(), 10 * 1e-3);
		String missedText = VOLTAGE_INDICATOR + "require switch_on_voltage 9 V between TIP and COM #! requirement\n";
		DesignResult missed = Fixtures.check(missedText);
		assertEquals(Fixtures.expected(missedText, ID), Fixtures.actual(missed, ID));
		Finding f = Fixtures.only(missed, ID);
		assertEquals(10, f.value(), 10 * 1e-3);
		assertEquals(9, f.limit(), 0);
		assertTrue(f.message().startsWith("switch on voltage between TIP and COM is 10 V, required at most 9 V"), f.message());
	}

	/**
	 * Without a named pair, every terminal with the common one must come on: a second input with no lamp of
	 * its own never does, and the requirement is missed rather than judged on the first input alone.
	 */
	@Test
	void everyPairMustComeOnWhenNoneIsNamed() {
		String two = VOLTAGE_INDICATOR.replace("terminal COM at gnd common", """
				terminal COM at gnd common
				net spare
				terminal AUX at spare
				resistor R_AUX (a: spare, b: gnd) { value 100 kΩ package 2512 rated power 1 W rated voltage 1 kV }""");
		DesignResult r = Fixtures.check(two + "require switch_on_voltage 12 V\n");
		Finding f = Fixtures.only(r, ID);
		assertEquals(Severity.ERROR, f.severity());
		assertTrue(f.message().startsWith("switch on voltage (required: at most 12 V) is not met"), f.message());
	}

	@Test
	void anLedLightsOneWayRoundOnly() {
		String led = VOLTAGE_INDICATOR.replace(
				"indicator L1 (a: lamp, b: gnd) { resistance 1 kΩ activation 1 mA rated power 1 W rated voltage 1 kV }",
				"led D1 (anode: lamp, cathode: gnd) { colour red rated forward 1 A rated reverse 1 kV rated power 10 W }");
		DesignResult r = Fixtures.check(led + "require switch_on_voltage 12 V between COM and TIP\n");
		var pair = r.function().pairs().get(0);
		// TIP positive: 1 mA through 9 kΩ plus the LED's forward drop (about 2 V) — between 9 V and 12 V
		assertTrue(pair.forward().onVolts() > 9 && pair.forward().onVolts() < 12, pair.forward().toString());
		assertEquals(null, pair.reverse().onVolts());
		// required and never shown: a missed requirement, an error, not a warning that it cannot be checked
		Finding f = Fixtures.only(r, ID);
		assertEquals(Severity.ERROR, f.severity());
		assertTrue(f.message().startsWith("switch on voltage between COM and TIP (required: at most 12 V) is not met: D1 does "
				+ "not come on as a DC voltage across the terminals rises to 1 kV"), f.message());
	}

	/**
	 * A battery tester whose LED is lit straight from the cell, whatever the terminals do: on with them shorted
	 * or open, and on at the bottom of any voltage across them, so it shows nothing — an error, with no
	 * requirement stated. (The same with its LED reversed across the terminals does switch: a voltage the other
	 * way round lights it.)
	 */
	@Test
	void aTesterThatNeverSwitchesIsAnError() {
		String alwaysOn = """
				design "probe whose LED is always on"
				reference net gnd
				net bat
				net tip
				net lamp
				terminal TIP at tip
				terminal COM at gnd common
				battery B1 (plus: bat, minus: gnd) { emf 3 V resistance 10 Ω capacity 200 mAh }
				resistor R1 (a: bat, b: tip) { value 1 kΩ package 1206 rated power 250 mW }
				resistor R2 (a: bat, b: lamp) { value 470 Ω package 1206 rated power 250 mW }
				led D1 (anode: lamp, cathode: gnd) { colour red rated reverse 5 V rated forward 20 mA rated power 100 mW }
				""";
		DesignResult r = Fixtures.checkAllowingTrouble(alwaysOn, Fixtures.AS_WRITTEN);
		Finding f = r.findings().stream().filter(x -> x.rule().equals(ID) && x.message().startsWith("D1 never switches"))
				.findFirst().orElseThrow(() -> new AssertionError(r.findings().toString()));
		assertEquals(Severity.ERROR, f.severity());
		assertTrue(f.message().contains("it stays on"), f.message());
		// the continuity tester of the other tests switches, and is not said to be broken
		Fixtures.check(CHECKER).findings().forEach(x -> assertTrue(!x.message().contains("never switches"), x.message()));
	}

	@Test
	void silentWhenEveryRequirementIsMet() {
		String met = Fixtures.replaced(Fixtures.replaced(CHECKER, "8766 h #! requirement", "8000 h"), "10 mA between CORE and SCREEN #! requirement", "15 mA between CORE and SCREEN");
		DesignResult r = Fixtures.check(met);
		assertEquals(Fixtures.expected(met, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}

	@Test
	void aBatteryTesterWithoutRequirementsIsHeldToCommonPractice() {
		String none = CHECKER.replaceAll("require .*\\n", "");
		DesignResult r = Fixtures.check(none);
		Finding life = Fixtures.only(r, ID);
		assertEquals(Severity.WARNING, life.severity());
		assertTrue(life.message().contains("common practice for a battery-powered tester at least 8766 h"), life.message());
		assertEquals(1, life.location().line()); // on the design's title
	}
}
