package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.rules.SingleFaultRule;

/**
 * Single faults: each part failed in turn, every case solved again, and a finding where another part then
 * exceeds its absolute rating. Each figure below by hand, in the comment beside it.
 */
class SingleFaultRuleTest {
	private static final ReviewPolicy ASKED_FOR = Fixtures.policy("""
			policy "100 V on the terminals, single faults"
			  mains none
			  level 100 V
			  severity "single-fault" warning
			""");

	/** Two equal resistors in series across the terminals; R2 is the weaker. */
	private static final String TWO_EQUAL = """
			design "two equal resistors in series"
			reference net gnd
			net in
			net mid
			terminal IN at in
			terminal COM at gnd common
			resistor R1 (a: in, b: mid) { value 10 kΩ rated power 2 W rated voltage 500 V } #! single-fault
			resistor R2 (a: mid, b: gnd) { value 10 kΩ rated power 500 mW rated voltage 500 V }
			""";

	@Test
	void shortingOneOfTwoEqualResistorsQuadruplesTheOthersPower() throws Exception {
		DesignResult r = Fixtures.check(TWO_EQUAL, ASKED_FOR);
		assertEquals(Fixtures.expected(TWO_EQUAL, SingleFaultRule.ID), Fixtures.actual(r, SingleFaultRule.ID));
		// normally each takes (V/2)²/R = 50² / 10 kΩ = 250 mW; with R1 shorted (1 Ω) R2 takes
		// (100 V × 10 kΩ / 10.001 kΩ)² / 10 kΩ = 0.9998 W ≈ V²/R [closed form, a divider], twice its absolute
		// 500 mW; R2 shorted leaves R1 its 1 W of 2 W, and an open one carries nothing
		Finding f = Fixtures.only(r, SingleFaultRule.ID);
		assertEquals("R1", f.part());
		assertEquals(Math.pow(100 * 10e3 / (10e3 + 1), 2) / 10e3, f.value(), 1e-9);
		assertEquals(0.5, f.limit(), 0);
		assertTrue(f.message().startsWith("with R1 short, case '"), f.message());
		assertTrue(f.message().contains("puts power 1 W on R2 (rated 500 mW, 200 % of it): the protection of R2 relies on"
				+ " R1 alone"), f.message());
		// the report carries the fault and each consequence for tools that must not parse the message
		java.io.StringWriter json = new java.io.StringWriter();
		bulwark.check.report.JsonReport.write(List.of(r), "test", "caution", json);
		assertTrue(json.toString().contains("\"singleFault\": {") && json.toString().contains("\"mode\": \"short\"")
				&& json.toString().contains("\"rating\": \"power\""), json.toString());
		// the normal check, derated to 60 %, passes: 250 mW of R2's 300 mW
		assertTrue(r.findings().stream().noneMatch(x -> x.rule().text().equals("resistor-power")), r.findings().toString());
	}

	@Test
	void silentWhenEachSurvivesTheOthersFailure() {
		String strong = Fixtures.replaced(Fixtures.replaced(TWO_EQUAL, "rated power 500 mW", "rated power 2 W"),
				" #! single-fault", "");
		DesignResult r = Fixtures.check(strong, ASKED_FOR);
		assertEquals(Fixtures.expected(strong, SingleFaultRule.ID), Fixtures.actual(r, SingleFaultRule.ID));
		Fixtures.assertSilent(r, SingleFaultRule.ID);
	}

	/**
	 * A comparator that drives an LED through 150 Ω from a 5 V rail, its output low at rest (in+ below in−):
	 * stuck high, it puts (5 − Vf) / (150 + 1) Ω of forward current through the LED, about 20 mA for a red
	 * one's 2 V [closed form, less the output stage's share], over its absolute 10 mA.
	 */
	private static final String DRIVER = """
			design "comparator driving an LED"
			reference net gnd
			net vcc
			net ref
			net in
			net out
			net lamp
			terminal IN at in
			terminal COM at gnd common
			source V1 (plus: vcc, minus: gnd) { voltage 5 V }
			resistor RA (a: vcc, b: ref) { value 10 kΩ rated power 250 mW rated voltage 500 V }
			resistor RB (a: ref, b: gnd) { value 10 kΩ rated power 250 mW rated voltage 500 V }
			resistor RIN (a: in, b: gnd) { value 100 kΩ rated power 2 W rated voltage 500 V }
			comparator U1 (in_plus: in, in_minus: ref, out: out, supply_plus: vcc, supply_minus: gnd) { rated supply 200 V rated input_margin 200 V rated clamp 1 A } #! single-fault
			resistor RL (a: out, b: lamp) { value 150 Ω rated power 250 mW rated voltage 500 V }
			led D1 (anode: lamp, cathode: gnd) { colour red rated forward 10 mA rated reverse 5 V rated power 1 W }
			""";

	@Test
	void aComparatorStuckHighOverdrivesTheLedItDrives() {
		ReviewPolicy quiet = Fixtures.policy("""
				policy "no abuse, single faults"
				  mains none
				  severity "single-fault" warning
				""");
		DesignResult r = Fixtures.check(DRIVER, quiet);
		assertEquals(Fixtures.expected(DRIVER, SingleFaultRule.ID), Fixtures.actual(r, SingleFaultRule.ID));
		Finding f = Fixtures.only(r, SingleFaultRule.ID);
		assertTrue(f.message().startsWith("with U1 output stuck high, case '"), f.message());
		assertTrue(f.message().contains("on D1"), f.message());
		assertTrue(f.value() > 0.015 && f.value() < 0.021, "forward current " + f.value());
	}

	/**
	 * A potentiometer's wiper open: the track still joins a and b (10 V across 10 kΩ, 1 mA), the wiper's load
	 * of 10 kΩ is left on 1 GΩ: 10 V · 10 kΩ / (1 GΩ + 10 kΩ) ≈ 0.1 mV at the wiper [closed form, a divider].
	 */
	@Test
	void aWiperOpenLeavesTheTrackAndLiftsTheWiper() {
		String pot = """
				design "pot"
				reference net gnd
				net top
				net w
				source V1 (plus: top, minus: gnd) { voltage 10 V }
				potentiometer P1 (a: top, b: gnd, wiper: w) { value 10 kΩ position 0.5 rated power 1 W }
				resistor RL (a: w, b: gnd) { value 10 kΩ rated power 1 W rated voltage 500 V }
				""";
		var p = Fixtures.checker().prepare(pot, "pot.bulwark", org.eclipse.xtext.util.CancelIndicator.NullImpl);
		var compiled = ((bulwark.check.Preparation.Ready) p).design().compiled();
		var failed = bulwark.check.faults.FaultInjector.apply(compiled,
				new bulwark.check.faults.Fault("P1", bulwark.check.faults.FailureMode.WIPER_OPEN));
		var s = (bulwark.engine.solve.DcSolution) new bulwark.engine.solve.DcSolver().solve(failed.circuit());
		assertEquals(10 * 10e3 / (1e9 + 10e3), s.device("RL").voltage(), 1e-9);
		assertEquals(10 / 10e3, Math.abs(s.device("V1").current()), 1e-6);
	}

	/** A part the designer vouches for is not failed, and the report says so with the designer's reason. */
	@Test
	void aPartOfHighIntegrityIsNotFailedAndTheReasonIsShown() {
		String vouched = TWO_EQUAL.replace("resistor R1 (a: in, b: mid) { value 10 kΩ rated power 2 W rated voltage 500 V } #! single-fault",
				"resistor R1 (a: in, b: mid) { value 10 kΩ rated power 2 W rated voltage 500 V integrity high because \"a "
						+ "fusible resistor that opens, never shorts\" }");
		DesignResult r = Fixtures.check(vouched, ASKED_FOR);
		List<Finding> found = r.findings().stream().filter(f -> f.rule().equals(SingleFaultRule.ID)).toList();
		assertEquals(1, found.size(), found.toString());
		assertEquals("R1 is not failed in the single-fault analysis: integrity high, because \"a fusible resistor that "
				+ "opens, never shorts\"", found.get(0).message());
	}

	@Test
	void notRunUnlessAskedFor() {
		DesignResult r = Fixtures.check(TWO_EQUAL, Fixtures.policy("""
				policy "100 V on the terminals"
				  mains none
				  level 100 V
				"""));
		Fixtures.assertSilent(r, SingleFaultRule.ID);
	}

	@Test
	void aShortedBlockingDiodeExposesTheLedToTheReversedLevel() {
		// (the normal check passes the LED: RSH keeps its reverse voltage near nought while D1 blocks)
		// reversed, D1 blocks the 100 V and RSH holds the LED at nought; with D1 shorted (1 Ω) R1 and RSH divide
		// the 100 V, the LED's reverse leakage drawing nothing: 100 V × 100 kΩ / 120 kΩ = 83.3 V against its 5 V
		// [closed form, a divider]
		String blocked = """
				design "a blocking diode before an indicator"
				reference net gnd
				net in
				net mid
				net lamp
				terminal IN at in
				terminal COM at gnd common
				diode D1 (anode: in, cathode: mid) { rated reverse 1000 V rated forward 1 A }
				resistor R1 (a: mid, b: lamp) { value 20 kΩ rated power 2 W rated voltage 500 V }
				led LED1 (anode: lamp, cathode: gnd) { forward 2 V rated reverse 5 V rated forward 20 mA }
				resistor RSH (a: lamp, b: gnd) { value 100 kΩ rated power 2 W rated voltage 500 V }
				""";
		DesignResult r = Fixtures.check(blocked, ASKED_FOR);
		List<Finding> faults = r.findings().stream().filter(f -> f.rule().equals(SingleFaultRule.ID)).toList();
		Finding diode = faults.stream().filter(f -> f.part().equals("D1")).findFirst()
				.orElseThrow(() -> new AssertionError("no finding for D1 shorted: " + r.findings()));
		assertTrue(diode.message().startsWith("with D1 short, "), diode.message());
		assertTrue(diode.message().contains("on LED1"), diode.message());
		assertEquals(100 * 100e3 / 120e3, diode.value(), 0.5);
		assertTrue(r.findings().stream().noneMatch(f -> f.rule().text().equals("diode-reverse")), r.findings().toString());
		assertEquals(5, diode.limit(), 0);
	}
}
