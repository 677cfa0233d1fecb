package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.engine.solve.DcSolution;

/**
 * `output open_drain`: the comparator only pulls its output down, through its on-resistance (50 Ω by
 * default); a pull-up of 10 kΩ to 5 V lifts it otherwise. Low: 5 V·50/(50 + 10 000) = 24.9 mV; off: the
 * whole 5 V, as nothing else loads it [closed form, divider].
 */
class OpenDrainOutputTest {
	private static String design(String input) {
		return """
				design "open-drain output"
				reference net gnd
				net vcc
				net in
				net ref
				net out
				source V1 (plus: vcc, minus: gnd) { voltage 5 V }
				source V2 (plus: in, minus: gnd) { voltage %s }
				resistor R_TOP (a: vcc, b: ref) { value 10 kΩ rated power 250 mW package 0805 }
				resistor R_BOT (a: ref, b: gnd) { value 10 kΩ rated power 250 mW package 0805 }
				resistor R_UP (a: vcc, b: out) { value 10 kΩ rated power 250 mW package 0805 }
				comparator U1 (in_plus: in, in_minus: ref, out: out, supply_plus: vcc, supply_minus: gnd) { output open_drain }
				""".formatted(input);
	}

	private static double out(String input) {
		DcSolution normal = (DcSolution) Fixtures.outcomes(design(input)).get(0).result();
		return normal.device("U1").pinVoltage("out");
	}

	@Test
	void pullsDownWhenTheInputIsBelowTheReference() {
		assertEquals(5.0 * 50 / 10050, out("2 V"), 1e-4);
	}

	@Test
	void letsThePullUpLiftItOtherwise() {
		assertEquals(5.0, out("3 V"), 1e-3);
	}
}
