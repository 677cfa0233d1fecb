package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Comparator;
import bulwark.engine.circuit.Potentiometer;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.device.ComparatorModel;

/** A potentiometer divider, and the behavioural amplifier model used as an op-amp in feedback. */
class PotentiometerAndOpAmpTest {

	@Test
	void wiperDividesTheTrack() {
		// 10 kΩ track at 30 %, wiper loaded by 10 kΩ: Thevenin 12·0.7 V behind 3k‖7k, into 10 kΩ [closed form]
		Circuit.Builder b = Circuit.withReference("gnd");
		int top = b.net("top"), w = b.net("wiper");
		b.add(VoltageSource.ideal("V1", top, 0, 12)).add(new Potentiometer("P1", top, 0, w, 10e3, 0.3))
				.add(new Resistor("RL", w, 0, 10e3));
		DcSolution s = (DcSolution) new DcSolver().solve(b.build());
		double rth = 3e3 * 7e3 / 10e3, vth = 12 * 0.7;
		assertEquals(vth * 10e3 / (10e3 + rth), s.voltage("wiper"), 1e-12);
		assertEquals(0, s.device("P1").pinCurrent("a") + s.device("P1").pinCurrent("b")
				+ s.device("P1").pinCurrent("wiper"), 1e-15);
	}

	@Test
	void nonInvertingAmplifier() {
		// gain 1 + R2/R1 = 11 from ±15 V rails, 0.5 V in: 5.5 V out, less the loop's error 5.5·11/A [closed form,
		// finite open-loop gain A = 1e5 of the generic model]
		Circuit.Builder b = Circuit.withReference("gnd");
		int vp = b.net("vp"), vn = b.net("vn"), in = b.net("in"), fb = b.net("fb"), out = b.net("out");
		b.add(VoltageSource.ideal("VP", vp, 0, 15)).add(VoltageSource.ideal("VN", vn, 0, -15))
				.add(VoltageSource.ideal("VIN", in, 0, 0.5)).add(new Resistor("R1", fb, 0, 1e3))
				.add(new Resistor("R2", out, fb, 10e3)).add(new Resistor("RL", out, 0, 10e3))
				.add(new Comparator("U1", in, fb, out, vp, vn, ComparatorModel.GENERIC));
		DcSolution s = (DcSolution) new DcSolver().solve(b.build());
		assertEquals(5.5, s.voltage("out"), 5.5 * 11 / 1e5 * 2);
	}
}
