package bulwark.benchmarks;

import bulwark.engine.circuit.Bjt;
import bulwark.engine.circuit.Bjt.Polarity;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.device.BjtModel;
import bulwark.engine.device.DiodeModel;

/** The circuits the benchmarks solve. */
final class Circuits {
	private Circuits() {
	}

	/**
	 * A probe-style input stage of 40 parts: a battery, a divider-fed comparator stand-in of two transistor
	 * pairs, clamp diodes, zeners, an LED driver and series strings of input resistors.
	 */
	static Circuit probe() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int bat = b.net("bat"), tip = b.net("tip"), in = b.net("in"), ref = b.net("ref");
		b.add(new VoltageSource("B1", bat, 0, 9, 1.5));
		b.add(VoltageSource.ideal("VTEST", tip, 0, 325)); // mains peak on the probe tip
		int prev = tip;
		for (int i = 1; i <= 6; i++) { // series string of input resistors
			int next = i == 6 ? in : b.net("s" + i);
			b.add(new Resistor("RS" + i, prev, next, 220e3));
			prev = next;
		}
		b.diode("DC1", in, bat, DiodeModel.SILICON); // clamps to the rails
		b.diode("DC2", 0, in, DiodeModel.SILICON);
		b.diode("ZIN", 0, in, DiodeModel.SILICON.withBreakdown(5.6, 5e-3));
		b.add(new Resistor("RIN", in, 0, 1e6));
		b.add(new Resistor("RR1", bat, ref, 100e3)).add(new Resistor("RR2", ref, 0, 47e3));
		b.diode("ZREF", 0, ref, DiodeModel.SILICON.withBreakdown(2.7, 5e-3));
		// a long-tailed pair as the comparator's front
		int tail = b.net("tail"), c1 = b.net("c1"), c2 = b.net("c2");
		b.add(new Resistor("RT", tail, 0, 22e3)).add(new Resistor("RC1", bat, c1, 47e3))
				.add(new Resistor("RC2", bat, c2, 47e3));
		b.add(new Bjt("Q1", c1, in, tail, Polarity.NPN, BjtModel.SMALL_SIGNAL));
		b.add(new Bjt("Q2", c2, ref, tail, Polarity.NPN, BjtModel.SMALL_SIGNAL));
		// second stage and LED driver
		int e3 = b.net("e3"), c3 = b.net("c3"), led = b.net("led"), c4 = b.net("c4"), b4 = b.net("b4");
		b.add(new Resistor("RE3", bat, e3, 4.7e3)).add(new Bjt("Q3", c3, c2, e3, Polarity.PNP, BjtModel.SMALL_SIGNAL));
		b.add(new Resistor("RC3", c3, b4, 10e3)).add(new Resistor("RB4", b4, 0, 47e3));
		b.add(new Bjt("Q4", c4, b4, 0, Polarity.NPN, BjtModel.SMALL_SIGNAL));
		b.add(new Resistor("RLED", bat, led, 680)).diode("LED1", led, c4, DiodeModel.SILICON.withSaturation(1e-18, 2));
		b.add(new Resistor("RH", c4, in, 1e6)); // hysteresis feedback
		// buzzer branch and a reverse-polarity diode
		int bz = b.net("bz"), rp = b.net("rp");
		b.add(new Resistor("RBZ", bat, bz, 1e3)).diode("DBZ", bz, c4, DiodeModel.SILICON);
		b.add(new Resistor("RRP", bat, rp, 10)).diode("DRP", rp, 0, DiodeModel.SILICON.withBreakdown(50, 1e-3));
		b.add(new Resistor("RL1", bat, 0, 1e6)).add(new Resistor("RL2", ref, in, 10e6))
				.add(new Resistor("RL3", c1, c2, 10e6));
		return b.build();
	}

	/** A square mesh of 1 kΩ resistors with about {@code nets} nets, fed by a source at one corner. */
	static Circuit mesh(int nets) {
		int side = (int) Math.round(Math.sqrt(nets));
		Circuit.Builder b = Circuit.withReference("gnd");
		int[][] id = new int[side][side];
		for (int r = 0; r < side; r++) {
			for (int c = 0; c < side; c++) {
				id[r][c] = b.net("n" + r + "_" + c);
			}
		}
		b.add(new VoltageSource("V1", id[0][0], 0, 10, 1));
		for (int r = 0; r < side; r++) {
			for (int c = 0; c < side; c++) {
				if (c + 1 < side) {
					b.add(new Resistor("RH" + r + "_" + c, id[r][c], id[r][c + 1], 1e3));
				}
				if (r + 1 < side) {
					b.add(new Resistor("RV" + r + "_" + c, id[r][c], id[r + 1][c], 1e3));
				}
			}
		}
		b.add(new Resistor("RLOAD", id[side - 1][side - 1], 0, 1e3));
		return b.build();
	}
}
