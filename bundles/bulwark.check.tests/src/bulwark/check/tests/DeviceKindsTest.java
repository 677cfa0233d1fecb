package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.PartStress;
import bulwark.check.Status;

/** Diodes, zeners, LEDs and transistors from the language reach the engine with their parameters. */
class DeviceKindsTest {

	private static PartStress part(DesignResult r, String name) {
		CaseResult c = r.cases().get(0);
		return c.parts().stream().filter(p -> p.part().equals(name)).findFirst().orElseThrow();
	}

	@Test
	void ledCarriesItsReferenceCurrentAtItsForwardVoltage() {
		// An LED declared with 'forward 2.1 V' is modelled to pass 20 mA at 2.1 V [definition of the parameter]
		DesignResult r = Fixtures.check("""
				design "led"
				reference net gnd
				net a
				source V1 (plus: a, minus: gnd) { voltage 2.1 V }
				led D1 (anode: a, cathode: gnd) { forward 2.1 V }
				""");
		assertEquals(Status.PASS, r.status(), r.findings().toString());
		assertEquals(20e-3, part(r, "D1").current(), 20e-3 * 1e-9);
	}

	@Test
	void zenerClampsNearItsVoltage() {
		// 12 V through 1 kΩ into a 5.1 V zener rated at 5 mA: Vz = 5.1 V + Vt·ln(I / 5 mA) [closed form]
		DesignResult r = Fixtures.check("""
				design "zener"
				reference net gnd
				net a
				net k
				source V1 (plus: a, minus: gnd) { voltage 12 V }
				resistor R1 (a: a, b: k) { value 1 kΩ rated power 250 mW }
				zener Z1 (anode: gnd, cathode: k) { breakdown 5.1 V }
				""");
		double vz = -part(r, "Z1").voltage();
		double i = (12 - vz) / 1e3;
		assertEquals(5.1 + 0.025851999786 * Math.log(i / 5e-3), vz, 1e-6);
	}

	@Test
	void comparatorSwitchesOnItsInputs() {
		// in+ at 3 V against 2.5 V on in−: the push-pull output sits at the upper rail, less the drop of its
		// 50 Ω output resistance into a 10 kΩ load: 5·10k/10.05k [closed form, divider]
		DesignResult r = Fixtures.check("""
				design "comparator"
				reference net gnd
				net vcc
				net ref
				net sig
				net out
				source VCC (plus: vcc, minus: gnd) { voltage 5 V }
				source VREF (plus: ref, minus: gnd) { voltage 2.5 V }
				source VSIG (plus: sig, minus: gnd) { voltage 3 V }
				comparator U1 (in_plus: sig, in_minus: ref, out: out, supply_plus: vcc, supply_minus: gnd)
				resistor RL (a: out, b: gnd) { value 10 kΩ rated power 125 mW }
				""");
		assertEquals(Status.PASS, r.status(), r.findings().toString());
		assertEquals(5 * 10e3 / 10.05e3, part(r, "RL").voltage(), 1e-3);
	}

	@Test
	void transistorSwitchSaturates() {
		DesignResult r = Fixtures.check("""
				design "switch"
				reference net gnd
				net v
				net b
				net c
				source V1 (plus: v, minus: gnd) { voltage 5 V }
				resistor RB (a: v, b: b) { value 4.7 kΩ rated power 125 mW }
				resistor RC (a: v, b: c) { value 1 kΩ rated power 125 mW }
				npn Q1 (collector: c, base: b, emitter: gnd) { beta 100 }
				""");
		assertEquals(Status.PASS, r.status(), r.findings().toString());
		double vce = part(r, "RC").current() > 0 ? 5 - part(r, "RC").voltage() : Double.NaN;
		assertTrue(vce < 0.2, "Vce(sat) " + vce);
	}
}
