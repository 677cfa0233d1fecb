package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.Status;
import bulwark.check.WorstStress;
import bulwark.check.policy.DefaultPolicy;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.finding.Finding;
import bulwark.check.rules.ResistorVoltageRule;
import bulwark.check.rules.SurgeEnergyRule;
import bulwark.check.rules.ResistorPowerRule;

/**
 * Mains applied as the sine it is: 230 V + 10 % (IEC 60038) is 253 V RMS, 357.8 V at the crest, at 50 Hz
 * [published + closed form, docs/sources.md#mains-and-surges]. Each figure below is worked by hand beside it.
 */
class MainsWaveformTest {
	private static final double RMS = 253;
	private static final double PEAK = 253 * Math.sqrt(2);
	private static final double OMEGA = 2 * Math.PI * 50;

	/** Only 230 V mains across the terminals; nothing derated, so the figures are the solved ones. */
	private static final ReviewPolicy MAINS_ONLY = DefaultPolicy.POLICY.with("230 V mains only",
			new ReviewPolicy.Abuse(List.of(new ReviewPolicy.MainsSystem(230, 10)), List.of(), List.of())).notDerated();

	private static final String HEAD = """
			design "mains across the terminals"
			reference net gnd
			net tip
			net mid
			terminal TIP at tip
			terminal COM at gnd common
			""";

	private static WorstStress worst(DesignResult r, String part, String rating) {
		return r.stresses().stream().filter(s -> s.part().equals(part) && s.rating().equals(rating)).findFirst()
				.orElseThrow(() -> new AssertionError("no " + rating + " figure for " + part + ": " + r.stresses()));
	}

	@Test
	void aResistorAcrossMainsDissipatesTheRmsSquaredOverR() {
		DesignResult r = Fixtures.check(HEAD + """
				resistor R1 (a: tip, b: gnd) { value 100 kΩ rated power 2 W rated voltage 500 V }
				resistor R2 (a: mid, b: gnd) { value 1 kΩ rated power 250 mW }
				""", MAINS_ONLY);
		// P = V_rms²/R = 253²/100 kΩ = 0.64009 W; the mean of sin² over 36 equal phases is exactly ½
		WorstStress power = worst(r, "R1", "power");
		assertEquals(RMS * RMS / 100e3, power.value(), 1e-9);
		assertEquals("average power over the cycle", power.what());
		// its voltage rating sees a crest, 357.8 V, at 5 ms or 15 ms (90° or 270°) of the cycle
		WorstStress voltage = worst(r, "R1", "voltage");
		assertEquals(PEAK, voltage.value(), 1e-6);
		assertTrue(voltage.caseName().matches(".*(COM \\+ to TIP −, at 5 ms|TIP \\+ to COM −, at 15 ms)"),
				voltage.caseName());
		assertNotEquals(Status.ERROR, r.status(), r.findings().toString());
	}

	@Test
	void behindADiodeOnlyHalfTheCycleDissipates() {
		DesignResult r = Fixtures.check(HEAD + """
				diode D1 (anode: tip, cathode: mid) { rated reverse 1000 V }
				resistor R1 (a: mid, b: gnd) { value 100 kΩ rated power 2 W rated voltage 500 V }
				""", MAINS_ONLY);
		// conducting half-cycles only, less the diode's drop Vd: P = (1/2πR)·∫₀^π (Vp·sin θ − Vd)² dθ
		// = (Vp²/4 − 2·Vp·Vd/π + Vd²/2)/R; for Vd from 0.5 V to 0.8 V, 0.31891 W down to 0.31823 W
		// (ideal diode: V_rms²/2R = 0.32005 W) [closed form, integral of (Vp·sin θ − Vd)² over a half-cycle]
		double p = worst(r, "R1", "power").value();
		assertTrue(p > 0.3182 && p < 0.3190, "average power behind the diode " + p);
		// the diode blocks the crest of the other half-cycle
		assertEquals(PEAK, worst(r, "D1", "reverse").value(), 1.0);
	}

	/** A capacitive dropper: 1 kΩ in series with 220 nF across the terminals. */
	static final String DROPPER = HEAD + """
			resistor R1 (a: tip, b: mid) { value 1 kΩ rated power 2 W rated voltage 500 V }
			capacitor C1 (a: mid, b: gnd) { value 220 nF rated voltage 630 V }
			""";

	@Test
	void aSeriesRcCarriesTheCurrentItsImpedanceAllows() {
		DesignResult r = Fixtures.check(DROPPER, MAINS_ONLY);
		assertNotEquals(Status.ERROR, r.status(), r.findings().toString());
		// |Z| = √(R² + (1/ωC)²) with 1/ωC = 14 469 Ω at 50 Hz: I_rms = 253/14 503.6 = 17.44 mA,
		// P(R1) = I_rms²·R = 0.3043 W [closed form, steady-state phasors]; the default leakage (454 MΩ) is negligible
		double reactance = 1 / (OMEGA * 220e-9);
		double irms = RMS / Math.hypot(1e3, reactance);
		assertEquals(irms * irms * 1e3, worst(r, "R1", "power").value(), 0.01 * irms * irms * 1e3);
		// the capacitor's crest in steady state: I_peak/ωC = 356.9 V; the switch-on reaches no higher, as the
		// circuit is critically far from ringing (first order)
		assertEquals(irms * Math.sqrt(2) * reactance, worst(r, "C1", "voltage").value(), 0.01 * PEAK);
	}

	@Test
	void switchedOnAtTheCrestTheResistorMeetsTheWholeCrest() {
		DesignResult r = Fixtures.check(DROPPER, MAINS_ONLY);
		// a discharged capacitor is a short at t = 0+: the resistor takes the whole 357.8 V then, against 24.7 V
		// (I_peak·R) in steady state [closed form, RC step response]; the first solved step, 20 ns, sees
		// e^(−h/RC) = e^(−20 ns/220 µs) of it, and the crest of cos falls by less than 1e-9 in that time
		WorstStress voltage = worst(r, "R1", "voltage");
		assertEquals(PEAK * Math.exp(-20e-9 / 220e-6), voltage.value(), 1e-3 * PEAK);
		assertTrue(voltage.caseName().contains("switched on at the crest"), voltage.caseName());
	}

	@Test
	void aNetHeldOnlyByCapacitorsIsChecked() {
		// mid is reached only through C1 and C2: without their leakage it has no DC path and nothing could be
		// solved; with it, the check runs. Steady state: equal capacitors share the voltage, 178.9 V each at
		// the crest [closed form, capacitive divider]
		DesignResult r = Fixtures.check(HEAD + """
				capacitor C1 (a: tip, b: mid) { value 100 nF rated voltage 630 V }
				capacitor C2 (a: mid, b: gnd) { value 100 nF rated voltage 630 V }
				resistor R1 (a: tip, b: gnd) { value 1 MΩ rated power 1 W rated voltage 500 V }
				""", MAINS_ONLY);
		assertNotEquals(Status.ERROR, r.status(), r.findings().toString());
		assertEquals(PEAK / 2, worst(r, "C2", "voltage").value(), 0.02 * PEAK);
	}

	@Test
	void theQuasiStaticSweepAndTheTransientAgreeWithoutMemory() {
		// the same resistive divider, once alone (swept phase by phase) and once with 1 pF across it (which
		// sends it through the transient to its steady state): at 50 Hz 1 pF is 3.2 GΩ, so both must agree
		String plain = HEAD + """
				resistor R1 (a: tip, b: mid) { value 47 kΩ rated power 2 W rated voltage 500 V }
				resistor R2 (a: mid, b: gnd) { value 10 kΩ rated power 2 W rated voltage 500 V }
				diode D1 (anode: mid, cathode: gnd) { rated reverse 1000 V }
				""";
		String withMemory = plain + "capacitor C1 (a: tip, b: gnd) { value 1 pF rated voltage 1000 V }\n";
		DesignResult sweep = Fixtures.check(plain, MAINS_ONLY);
		DesignResult integratedResult = Fixtures.check(withMemory, MAINS_ONLY);
		double swept = worst(sweep, "R1", "power").value();
		double integrated = worst(integratedResult, "R1", "power").value();
		assertEquals(swept, integrated, 0.005 * swept);
		// each says how it was solved
		assertEquals("quasi-static sweep of 36 operating points, each continued from the last",
				sweep.waveforms().get(0).method());
		assertTrue(integratedResult.waveforms().get(0).method().startsWith("transient analysis"),
				integratedResult.waveforms().toString());
	}

	@Test
	void aDesignerCaseMayApplyASine() {
		// the designer's own 120 V at 60 Hz behind 1 kΩ, with no mains in the policy: R1 (10 kΩ) takes
		// 10/11 of it, (120·10/11)²/10 kΩ = 1.19 W on average, and 120·√2·10/11 = 154.3 V at the crest
		// [closed form, divider and mean of sin²]
		String design = HEAD + """
				resistor R1 (a: tip, b: gnd) { value 10 kΩ rated power 2 W rated voltage 500 V }
				resistor R2 (a: mid, b: gnd) { value 1 kΩ rated power 250 mW }
				case "bench transformer" { apply 120 V at 60 Hz behind 1 kΩ from TIP to COM }
				""";
		DesignResult r = Fixtures.check(design);
		double share = 120.0 * 10 / 11;
		WorstStress power = worst(r, "R1", "power");
		assertEquals(share * share / 10e3, power.value(), 1e-6);
		assertEquals("average power over the cycle", power.what());
		assertEquals("bench transformer", power.caseName());
		assertEquals(share * Math.sqrt(2), worst(r, "R1", "voltage").value(), 1e-6);
		// a frequency in the wrong unit is refused where it is written
		DesignResult wrong = Fixtures.checkAllowingTrouble(Fixtures.replaced(design, "at 60 Hz", "at 60 V"));
		assertTrue(wrong.findings().stream().anyMatch(f -> f.message().contains("a sine's frequency")),
				wrong.findings().toString());
	}

	@Test
	void theMostStressedPartIsTracedOverTheCycleForThePlots() throws Exception {
		DesignResult r = Fixtures.check(DROPPER, MAINS_ONLY);
		bulwark.check.WaveformTrace t = r.waveforms().stream().findFirst()
				.orElseThrow(() -> new AssertionError("no waveform for the mains case: " + r.cases()));
		assertTrue(t.caseName().startsWith("230 V 50 Hz mains (358 V peak), steady state after"), t.caseName());
		assertTrue(t.method().startsWith("transient analysis from switch-on, steady after "), t.method());
		assertEquals(t.seconds().length, t.volts().length);
		assertEquals(t.seconds().length, t.amps().length);
		assertEquals(bulwark.check.WaveformTrace.SAMPLES, t.seconds().length);
		// one period of 50 Hz from the cycle's start
		assertEquals(0, t.seconds()[0], 0);
		assertEquals(20e-3, t.seconds()[t.seconds().length - 1], 0.5e-3);
		// the most stressed part is C1, at 57 % of its 630 V; its trace is the solution: its crest is the
		// phasor's, I_rms·√2/ωC = 356.9 V [closed form, as above], within the 1 − cos 1.5° of resampling
		assertEquals("C1", t.part());
		double reactance = 1 / (OMEGA * 220e-9);
		double expected = RMS / Math.hypot(1e3, reactance) * Math.sqrt(2) * reactance;
		double crest = 0;
		for (double v : t.volts()) {
			crest = Math.max(crest, Math.abs(v));
		}
		assertEquals(expected, crest, 0.01 * expected);
		java.io.StringWriter html = new java.io.StringWriter();
		bulwark.check.report.HtmlReport.write(List.of(r), "test", "caution", html);
		assertTrue(html.toString().contains("<title>waveform of " + t.part() + " in "), html.toString());
		java.io.StringWriter json = new java.io.StringWriter();
		bulwark.check.report.JsonReport.write(List.of(r), "test", "caution", json);
		assertTrue(json.toString().contains("\"waveforms\": [") && json.toString().contains("\"volts\": ["),
				json.toString());
		assertTrue(json.toString().contains("\"method\": \"transient analysis from switch-on"), json.toString());
		assertTrue(html.toString().contains("Solved by transient analysis from switch-on"), html.toString());
	}

	/** 230 V mains through a 100 mA fuse into 1 kΩ: the fuse opens, but not before the resistor meets the crest. */
	private static final String FUSED = HEAD + """
			fuse F1 (a: tip, b: mid) { rated current 100 mA rated voltage 500 V %s}
			resistor R1 (a: mid, b: gnd) { value 1 kΩ package 0805 rated power 250 mW rated pulse 2 J }
			""";

	@Test
	void aFuseOpensOnlyAfterItsPreArcingIntegral() {
		DesignResult r = Fixtures.check(String.format(FUSED, "rated i2t 20 mA²s "), MAINS_ONLY);
		// until F1 opens, R1 carries i = 357.8 V·cos(ωt)/1000.1 Ω from the crest: ∫i²dt = I²·(t/2 + sin 2ωt/4ω),
		// 1.28 mA²s per period (I_rms²·T = 0.2530² A² · 20 ms) [closed form]; 20 mA²s is reached after 15.6
		// periods, 0.3125 s
		double i = PEAK / 1000.1;
		double clears = 0.020 / (i * i / 2);
		Finding voltage = Fixtures.only(r, ResistorVoltageRule.ID);
		assertTrue(voltage.caseName().contains("before F1 opens"), voltage.caseName());
		// the 0805's 150 V element limit, derated to 120 V, meets the whole crest, 357.8 V·1000/1000.1
		assertEquals(PEAK * 1000 / 1000.1, voltage.value(), 1e-3);
		// its energy until then: the average power V_rms²/R over the interval, 64.0 W × 0.3125 s = 20 J, is far
		// over its 2 J pulse rating (derated)
		Finding energy = Fixtures.only(r, SurgeEnergyRule.ID);
		double joules = RMS * RMS * 1000 / (1000.1 * 1000.1) * clears;
		assertEquals(joules, energy.value(), 0.02 * joules);
		assertTrue(energy.message().contains("after 312") || energy.message().contains("after 313"), energy.message());
		assertTrue(r.findings().stream().noneMatch(f -> f.rule().equals(ResistorPowerRule.ID)),
				"the thermal power rating is not judged on the pre-clearing instants: " + r.findings());
	}

	@Test
	void aFuseWithoutAnIntegralTakesTheDefaultOfItsSize() {
		DesignResult r = Fixtures.check(String.format(FUSED, ""), MAINS_ONLY);
		// 2 A²s per A² of rated current [memory, IEC 60127-2's gate]: 0.02 A²s for 100 mA, as above
		Finding energy = Fixtures.only(r, SurgeEnergyRule.ID);
		assertTrue(energy.caseName().contains("pre-arcing I²t 20 mA²s"), energy.caseName());
	}

	@Test
	void aFuseThatHoldsAddsNoClearingCase() {
		DesignResult r = Fixtures.check(HEAD + """
				fuse F1 (a: tip, b: mid) { rated current 1 A rated voltage 500 V }
				resistor R1 (a: mid, b: gnd) { value 10 kΩ package axial_half rated power 10 W rated pulse 2 J }
				""", MAINS_ONLY);
		// 25.3 mA RMS through a 1 A fuse: it holds, and no case is named for its opening
		assertTrue(r.cases().stream().noneMatch(c -> c.name().contains("before F1 opens") || c.name().contains("F1 open")),
				r.cases().toString());
		Fixtures.assertSilent(r, SurgeEnergyRule.ID);
	}

	@Test
	void theSwitchOnInrushIsAPulseForTheResistor() {
		DesignResult r = Fixtures.check(DROPPER, MAINS_ONLY);
		// switched on at the crest, the discharged 220 nF charges to about the crest through R1, and a resistor
		// charging a capacitor takes ½·C·V² whatever its value [closed form, RC charging]: 14.08 mJ at 357.8 V;
		// the steady cycle's own share is taken off, and the capacitor's steady voltage at the crest is within
		// 0.3 % of it (1/ωC ≫ R)
		double expected = 0.5 * 220e-9 * PEAK * PEAK;
		Finding note = Fixtures.only(r, SurgeEnergyRule.ID);
		assertEquals(expected, note.value(), 0.05 * expected);
		assertEquals(bulwark.check.finding.Severity.INFO, note.severity(), "R1 has no pulse rating: a note asks for one");
		assertTrue(note.caseName().endsWith("switched on at the crest"), note.caseName());
	}
}
