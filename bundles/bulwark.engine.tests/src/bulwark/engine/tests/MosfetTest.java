package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Mosfet;
import bulwark.engine.circuit.Mosfet.Channel;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.device.MosfetModel;
import bulwark.engine.device.Physics;

/** Square-law MOSFET circuits against closed forms (Shichman–Hodges equations, solved here independently). */
class MosfetTest {
	private static final double RELATIVE = 1e-8;
	private static final MosfetModel M = MosfetModel.SMALL_SIGNAL; // Vth 2 V, β 50 mA/V², λ 0.01 /V

	private static DcSolution commonSource(Channel channel, double vdd, double vgate, double rd) {
		double s = channel == Channel.N ? 1 : -1;
		Circuit.Builder b = Circuit.withReference("gnd");
		int dd = b.net("vdd"), g = b.net("gate"), d = b.net("drain");
		b.add(VoltageSource.ideal("VDD", dd, 0, s * vdd)).add(VoltageSource.ideal("VG", g, 0, s * vgate))
				.add(new Resistor("RD", dd, d, rd)).add(new Mosfet("M1", d, g, 0, channel, M));
		DcResult r = new DcSolver().solve(b.build());
		return assertInstanceOf(DcSolution.class, r, () -> "no solution: " + r);
	}

	@Test
	void saturation() {
		// Id = (β/2)·ov²·(1 + λ·Vds), Vds = VDD − Id·RD → Id = (β/2)·ov²·(1 + λ·VDD) / (1 + (β/2)·ov²·λ·RD)
		double k = M.beta() / 2 * 1 * 1; // overdrive 1 V
		double id = k * (1 + M.lambda() * 12) / (1 + k * M.lambda() * 100);
		DcSolution s = commonSource(Channel.N, 12, 3, 100);
		assertEquals(id, s.device("M1").pinCurrent("drain"), id * RELATIVE);
		assertEquals(12 - id * 100, s.voltage("drain"), 1e-8);
	}

	@Test
	void triodeRegion() {
		// gate 10 V, VDD 5 V through 1 kΩ: Vds small; solve β((Vgs−Vth)·Vds − Vds²/2)(1 + λVds) = (5 − Vds)/1k by bisection
		double lo = 0, hi = 5;
		for (int i = 0; i < 200; i++) {
			double vds = (lo + hi) / 2;
			double f = M.beta() * (8 * vds - vds * vds / 2) * (1 + M.lambda() * vds) - (5 - vds) / 1e3;
			if (f > 0) {
				hi = vds;
			} else {
				lo = vds;
			}
		}
		DcSolution s = commonSource(Channel.N, 5, 10, 1e3);
		assertEquals(lo, s.voltage("drain"), 1e-9);
	}

	@Test
	void pChannelMirrorsNChannel() {
		DcSolution n = commonSource(Channel.N, 12, 3, 100);
		DcSolution p = commonSource(Channel.P, 12, 3, 100);
		assertEquals(n.voltage("drain"), -p.voltage("drain"), 1e-9);
		assertEquals(n.device("M1").pinCurrent("drain"), -p.device("M1").pinCurrent("drain"), 1e-12);
	}

	@Test
	void bodyDiodeConductsWhenTheDrainIsPulledBelowTheSource() {
		// gate and source at 0 V, drain pulled to −5 V through 1 kΩ: the source–drain body diode carries the
		// Lambert-W current of a 10 fA junction in series with 1 kΩ across 5 V [closed form, Banwell & Jayakumar]
		Circuit.Builder b = Circuit.withReference("gnd");
		int neg = b.net("neg"), d = b.net("drain");
		b.add(VoltageSource.ideal("VN", neg, 0, -5)).add(new Resistor("R1", d, neg, 1e3))
				.add(new Mosfet("M1", d, 0, 0, Channel.N, M));
		DcSolution s = (DcSolution) new DcSolver().solve(b.build());
		double exact = LambertW.diodeCurrent(5, 1e3, 1e-14, Physics.thermalVoltage(300));
		assertEquals(-exact, s.device("M1").pinCurrent("drain"), exact * 1e-6);
	}
}
