package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.rules.SurgeEnergyRule;
import bulwark.check.finding.RuleId;

class SurgeEnergyRuleTest {
	private static final RuleId ID = SurgeEnergyRule.ID;
	private static final ReviewPolicy SURGE = Fixtures.policy("""
			policy "surge only"
			  mains none
			  surge 1 kV behind 2 Ω
			""");

	/** 100 Ω straight across the terminals, rated for 0.2 J in one pulse. */
	static final String ACROSS = """
			design "a surge into a resistor"
			reference net gnd
			net tip
			terminal TIP at tip
			terminal COM at gnd common
			resistor R1 (a: tip, b: gnd) { value 100 Ω rated power 2 W rated voltage 2 kV rated pulse 200 mJ } #! surge-energy
			""";

	/**
	 * The energy R absorbs from the 1.2/50 µs wave v(t) = A·V·(1 − e^(−t/τ1))·e^(−t/τ2) behind Rs, over the
	 * first T seconds: R/(R + Rs)² · A²V² · ∫₀ᵀ (e^(−2t/τ2) − 2e^(−t(1/τ1 + 2/τ2)) + e^(−t(2/τ1 + 2/τ2))) dt
	 * [closed form; the constants of IEC 61000-4-5 annex A as the engine's CombinationWave holds them].
	 */
	static double closedForm(double volts, double sourceOhms, double ohms, double seconds) {
		double a = 1.037, t1 = 0.4074e-6, t2 = 68.22e-6;
		double integral = part(2 / t2, seconds) - 2 * part(1 / t1 + 2 / t2, seconds) + part(2 / t1 + 2 / t2, seconds);
		return ohms / Math.pow(ohms + sourceOhms, 2) * a * a * volts * volts * integral;
	}

	private static double part(double rate, double seconds) {
		return -Math.expm1(-rate * seconds) / rate;
	}

	@Test
	void triggersWithTheEnergyOfTheWave() {
		DesignResult r = Fixtures.check(ACROSS, SURGE);
		assertEquals(Fixtures.expected(ACROSS, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		// over the 150 µs the transient runs (98.8 % of the wave's energy): about 0.34 J
		double expected = closedForm(1000, 2, 100, 150e-6);
		assertEquals(expected, f.value(), expected * 0.01);
		assertEquals(0.2, f.limit(), 1e-12); // no derating of a single-pulse rating unless the policy asks
		assertEquals("J", f.unit());
		assertTrue(f.caseName().startsWith("surge 1 kV behind 2 Ω, ") && !f.caseName().contains(", at "), f.caseName());
		assertTrue(f.message().startsWith("R1: energy 3"), f.message());
	}

	@Test
	void silentWhenThePulseRatingHolds() {
		String holds = Fixtures.replaced(ACROSS, "rated pulse 200 mJ } #! surge-energy", "rated pulse 1 J }");
		DesignResult r = Fixtures.check(holds, SURGE);
		assertEquals(Fixtures.expected(holds, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
		// a figure that passes is still listed: the JSON's stresses carry every judged figure
		var pulse = r.stresses().stream().filter(s -> s.part().equals("R1") && s.rating().equals("pulse")).findFirst()
				.orElseThrow(() -> new AssertionError("no pulse figure for R1: " + r.stresses()));
		assertEquals(1.0, pulse.rated(), 1e-12);
		assertTrue(pulse.utilisation() > 0.3 && pulse.utilisation() < 0.4, "0.34 J of 1 J: " + pulse);
	}

	@Test
	void anUnratedResistorGetsANoteNotAnError() {
		String unrated = Fixtures.replaced(ACROSS, " rated pulse 200 mJ } #! surge-energy", " }");
		DesignResult r = Fixtures.check(unrated, SURGE);
		Finding f = r.findings().stream().filter(x -> x.rule().equals(ID)).findFirst().orElseThrow();
		assertEquals(Severity.INFO, f.severity());
		assertNull(f.limit());
		assertTrue(f.message().contains("no pulse rating"), f.message());
	}

	@Test
	void withoutSurgesInThePolicyNothingIsSaid() {
		DesignResult r = Fixtures.check(Fixtures.replaced(ACROSS, " #! surge-energy", ""), Fixtures.policy("""
				policy "no surge"
				  mains none
				"""));
		Fixtures.assertSilent(r, ID);
	}
}
