package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.rules.ResistorPowerRule;
import bulwark.check.rules.ResistorVoltageRule;
import bulwark.check.rules.SurgeEnergyRule;

/**
 * A fuse under a DC level opens once it has taken in its pre-arcing I²t, not at once: until then the parts
 * behind it carry the whole fault current, and that moment is judged — its voltages by their rules, its energy
 * as a pulse — while the thermal power rating is not.
 */
class FuseClearingTest {
	private static final String FUSED = """
			design "fused input"
			reference net gnd
			net tip
			net mid
			terminal TIP at tip
			terminal COM at gnd common
			fuse F1 (a: tip, b: mid) { rated current 100 mA rated voltage 250 V rated i2t 10 mA²s }
			resistor R1 (a: mid, b: gnd) { value 100 Ω package 0402 rated pulse 50 mJ }
			""";

	private static final String FORTY_EIGHT_VOLTS_ONLY = """
			policy "48 V only"
			  mains none
			  level 48 V
			""";

	@Test
	void theMomentBeforeTheFuseOpensIsJudged() {
		DesignResult r = Fixtures.check(FUSED, Fixtures.policy(FORTY_EIGHT_VOLTS_ONLY));
		// I = 48 V / 100.1 Ω = 0.4795 A through the 100 mA fuse: it opens after t = I²t / I² = 10 mA²s / 0.2299 A²
		// = 43.5 ms [closed form, constant current]
		double amps = 48 / 100.1, seconds = 0.010 / (amps * amps);
		Finding voltage = Fixtures.only(r, ResistorVoltageRule.ID);
		assertTrue(voltage.caseName().contains("before F1 opens"), voltage.caseName());
		// the 0402's 50 V element limit, derated to 80 % (40 V), meets 48 V·100/100.1 until then
		assertEquals(48 * 100 / 100.1, voltage.value(), 1e-6);
		// and it takes P·t = 23.0 W × 43.5 ms = 1.0 J, twenty times its 50 mJ pulse rating
		Finding energy = Fixtures.only(r, SurgeEnergyRule.ID);
		assertEquals(amps * amps * 100 * seconds, energy.value(), 1e-6);
		assertTrue(energy.caseName().contains("reached after 43.5 ms"), energy.caseName());
		assertTrue(r.findings().stream().noneMatch(f -> f.rule().equals(ResistorPowerRule.ID)),
				"a moment is not judged on the thermal power rating: " + r.findings());
		// after it the fuse is open and the case is solved so
		assertTrue(r.cases().stream().anyMatch(c -> c.name().endsWith("F1 open")), r.cases().toString());
	}

	@Test
	void aResettableFuseTakesSecondsToTripNotMilliseconds() {
		// a polymer fuse heats itself into its tripped state: by default 125 A²s per A² of hold current, here
		// 125 × (0.1 A)² = 1.25 A²s [memory, FuseRatings]; at I = 48 V / 100.1 Ω = 0.4795 A it trips after
		// t = 1.25 / 0.2299 = 5.44 s [closed form, constant current], and R1 takes 23.0 W × 5.44 s = 125 J
		String resettable = Fixtures.replaced(FUSED, "fuse F1 (a: tip, b: mid) { rated current 100 mA rated voltage 250 V rated i2t 10 mA²s }",
				"resettable_fuse F1 (a: tip, b: mid) { rated hold 100 mA rated voltage 250 V }");
		DesignResult r = Fixtures.check(resettable, Fixtures.policy(FORTY_EIGHT_VOLTS_ONLY));
		double amps = 48 / 100.1, seconds = 1.25 / (amps * amps);
		Finding energy = Fixtures.only(r, SurgeEnergyRule.ID);
		assertEquals(amps * amps * 100 * seconds, energy.value(), 1e-6 * energy.value());
		assertTrue(energy.caseName().contains("before F1 trips (I²t to trip 1.25 A²s reached after 5.44 s)"),
				energy.caseName());
		assertTrue(r.cases().stream().anyMatch(c -> c.name().endsWith("F1 tripped")), r.cases().toString());
	}
}
