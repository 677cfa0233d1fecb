package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Fuse;
import bulwark.engine.circuit.Indicator;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.DcSweep;
import bulwark.engine.device.DiodeModel;
import bulwark.engine.device.LedColour;

/** Fuses, indicator loads and LEDs by colour. */
class LoadsTest {

	@Test
	void indicatorTurnsOnAtItsActivationCurrentAlongAProbeResistanceSweep() {
		// 3 V cell, 100 Ω buzzer activating at 10 mA, probe resistance swept: on while 3/(100 + Rp) ≥ 10 mA,
		// i.e. below Rp = 200 Ω [closed form, Ohm's law]
		Circuit.Builder b = Circuit.withReference("gnd");
		int cell = b.net("cell"), tip = b.net("tip");
		b.add(VoltageSource.ideal("B1", cell, 0, 3)).add(new Indicator("BZ1", cell, tip, 100, 10e-3))
				.add(new Resistor("RPROBE", tip, 0, 1));
		Circuit c = b.build();
		Indicator buzzer = (Indicator) c.devices().get(1);
		DcSweep sweep = new DcSweep(new DcSolver(), DcSolver.prepare(c), "RPROBE", r -> new Resistor("RPROBE", tip, 0, r));
		double threshold = sweep.threshold(1, 1e4, 40, s -> buzzer.isOn(s.device("BZ1")), 1e-9).value().orElseThrow();
		assertEquals(200, threshold, 200 * 1e-8);
	}

	@Test
	void fuseCarriesItsCurrentAtItsColdResistance() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), out = b.net("out");
		b.add(VoltageSource.ideal("V1", in, 0, 12)).add(new Fuse("F1", in, out, 0.5, 0.1, false))
				.add(new Resistor("RL", out, 0, 59.5));
		DcSolution s = (DcSolution) new DcSolver().solve(b.build());
		assertEquals(0.2, s.device("F1").current(), 1e-12); // 12 V / 60 Ω [closed form]
		assertTrue(Math.abs(s.device("F1").current()) > 0.1, "over its 100 mA rating: the rating check's business");
	}

	@Test
	void ledColoursDropTheirForwardVoltageAt20mA() {
		for (LedColour colour : LedColour.values()) {
			DiodeModel led = DiodeModel.led(colour.forwardVolts(), 2);
			assertEquals(20e-3, led.current(colour.forwardVolts()), 20e-3 * 1e-9, colour.name());
			assertTrue(colour.forwardVolts() >= colour.lowest() && colour.forwardVolts() <= colour.highest());
		}
		assertFalse(LedColour.RED.forwardVolts() > LedColour.BLUE.forwardVolts());
	}
}
