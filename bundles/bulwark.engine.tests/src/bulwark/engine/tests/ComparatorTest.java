package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Comparator;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.DcSweep;
import bulwark.engine.solve.DcSweep.Threshold;
import bulwark.engine.solve.PreparedCircuit;
import bulwark.engine.device.ComparatorModel;

/** The behavioural comparator and the engine's up/down threshold sweeps (docs/sources.md#solver-oracles, "Comparator hysteresis"). */
class ComparatorTest {
	/** Thresholds come from a bisection to 1e-7 relative; the model's output resistance and finite gain
	 *  move them by well under a millivolt. */
	private static final double THRESHOLD_VOLTS = 1e-3;

	private static final double VCC = 5, VREF = 2.5, R1 = 10e3, R2 = 100e3;

	/** Non-inverting two-resistor hysteresis: R1 input → in+, R2 in+ → output, reference on in−. */
	private static Circuit schmitt(double vin) {
		Circuit.Builder b = Circuit.withReference("gnd");
		int vcc = b.net("vcc"), ref = b.net("ref"), in = b.net("in"), inp = b.net("inp"), out = b.net("out");
		b.add(VoltageSource.ideal("VCC", vcc, 0, VCC)).add(VoltageSource.ideal("VREF", ref, 0, VREF))
				.add(VoltageSource.ideal("VIN", in, 0, vin)).add(new Resistor("R1", in, inp, R1))
				.add(new Resistor("R2", inp, out, R2))
				.add(new Comparator("U1", inp, ref, out, vcc, 0, ComparatorModel.GENERIC));
		return b.build();
	}

	@Test
	void risingAndFallingThresholdsOfTheHysteresisLoop() {
		// rising Vref·(1 + R1/R2) = 2.75 V; falling (Vref·(R1 + R2) − VOH·R1)/R2 = 2.25 V; width VOH·R1/R2 = 0.5 V
		// [closed form; standard Schmitt-trigger analysis, docs/sources.md#solver-oracles]
		double rising = VREF * (1 + R1 / R2);
		double falling = (VREF * (R1 + R2) - VCC * R1) / R2;
		Circuit c = schmitt(1);
		int in = c.netIndex("in");
		DcSolver solver = new DcSolver();
		PreparedCircuit prepared = DcSolver.prepare(c);
		DcSweep sweep = new DcSweep(solver, prepared, "VIN", v -> VoltageSource.ideal("VIN", in, 0, v));
		Threshold up = sweep.threshold(1, 4, 30, s -> s.voltage("out") > VCC / 2, 1e-7);
		Threshold down = sweep.threshold(4, 1, 30, s -> s.voltage("out") > VCC / 2, 1e-7);
		assertEquals(rising, up.value().orElseThrow(), THRESHOLD_VOLTS);
		assertEquals(falling, down.value().orElseThrow(), THRESHOLD_VOLTS);
		assertEquals(VCC * R1 / R2, up.value().get() - down.value().get(), 2 * THRESHOLD_VOLTS);
	}

	@Test
	void insideTheLoopTheStateDependsOnTheWayIn() {
		Circuit c = schmitt(1);
		int in = c.netIndex("in");
		DcSweep sweep = new DcSweep(new DcSolver(), DcSolver.prepare(c), "VIN", v -> VoltageSource.ideal("VIN", in, 0, v));
		List<DcSweep.Point> upward = sweep.run(new double[] { 1, 2, 2.5 });
		List<DcSweep.Point> downward = sweep.run(new double[] { 4, 3, 2.5 });
		double outUp = ((DcSolution) upward.get(2).result()).voltage("out");
		double outDown = ((DcSolution) downward.get(2).result()).voltage("out");
		assertTrue(outUp < 0.01, "coming from below, 2.5 V leaves the output low: " + outUp);
		assertTrue(outDown > VCC - 0.01, "coming from above, 2.5 V leaves the output high: " + outDown);
	}

	@Test
	void openDrainOutputOnlySinks() {
		// open drain with a 10 kΩ pull-up to 5 V: off (in+ > in−) the pull-up sets 5 V; on, the 50 Ω on-resistance
		// pulls down to 5·50/10050 V [closed form, divider]
		ComparatorModel od = ComparatorModel.GENERIC.withOpenDrain(true);
		for (double vin : new double[] { 3, 2 }) {
			Circuit.Builder b = Circuit.withReference("gnd");
			int vcc = b.net("vcc"), ref = b.net("ref"), in = b.net("in"), out = b.net("out");
			b.add(VoltageSource.ideal("VCC", vcc, 0, VCC)).add(VoltageSource.ideal("VREF", ref, 0, VREF))
					.add(VoltageSource.ideal("VIN", in, 0, vin)).add(new Resistor("RPU", vcc, out, 10e3))
					.add(new Comparator("U1", in, ref, out, vcc, 0, od));
			DcSolution s = (DcSolution) new DcSolver().solve(b.build());
			double expected = vin > VREF ? VCC : VCC * 50 / 10050;
			assertEquals(expected, s.voltage("out"), 1e-6, "input " + vin);
		}
	}

	@Test
	void clampCurrentAtMainsPeakOnTheInput() {
		// 357.8 V peak through 1 MΩ into in+: the upper clamp conducts into the 5 V rail, I ≈ (357.8 − 5 − Vclamp)/1 MΩ
		double peak = 253 * Math.sqrt(2);
		Circuit.Builder b = Circuit.withReference("gnd");
		int vcc = b.net("vcc"), tip = b.net("tip"), inp = b.net("inp"), out = b.net("out");
		b.add(new VoltageSource("VCC", vcc, 0, VCC, 1)).add(VoltageSource.ideal("VTIP", tip, 0, peak))
				.add(new Resistor("RIN", tip, inp, 1e6)).add(new Resistor("RL", out, 0, 10e3))
				.add(new Comparator("U1", inp, 0, out, vcc, 0, ComparatorModel.GENERIC));
		for (double sign : new double[] { 1, -1 }) {
			Circuit circuit = sign > 0 ? b.build() : b.build().withDevice(1, VoltageSource.ideal("VTIP", tip, 0, -peak));
			DcResult r = new DcSolver().solve(circuit);
			DcSolution s = assertInstanceOf(DcSolution.class, r, () -> "no solution: " + r);
			double clamp = s.device("U1").pinCurrent("in_plus");
			double rail = sign > 0 ? s.voltage("vcc") : 0;
			double expected = (sign * peak - rail - sign * 0.6) / 1e6; // a silicon clamp drops about 0.6 V here
			assertEquals(expected, clamp, 2e-7, "polarity " + sign);
		}
	}
}
