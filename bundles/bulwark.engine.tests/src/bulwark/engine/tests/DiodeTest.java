package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.device.DiodeModel;
import bulwark.engine.device.Physics;

/** Diode circuits against closed forms (docs/sources.md#solver-oracles). */
class DiodeTest {
	/** Newton stops within 1e-9 relative; the comparison allows a little more. */
	private static final double RELATIVE = 1e-8;

	private static DcSolution solve(Circuit c) {
		DcResult r = new DcSolver().solve(c);
		return assertInstanceOf(DcSolution.class, r, () -> "expected a solution, got " + r);
	}

	/** Source V, resistor R from source to anode, diode to the reference. */
	private static DcSolution seriesCircuit(double volts, double ohms, DiodeModel model) {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), anode = b.net("anode");
		b.add(VoltageSource.ideal("V1", in, 0, volts)).add(new Resistor("R1", in, anode, ohms));
		b.diode("D1", anode, 0, model);
		return solve(b.build());
	}

	@Test
	void thermalVoltageAt300K() {
		// VT = kT/q with the SI 2019 exact constants: 25.851999786 mV at 300 K [published, docs/sources.md#solver-oracles]
		assertEquals(25.851999786e-3, Physics.thermalVoltage(300), 1e-12);
	}

	@Test
	void fiveVoltsThroughOneKilohm() {
		// 5 V, 1 kΩ, Is = 1e-14 A, n = 1, 300 K → I = 4.30745637 mA, Vd = 0.69254363 V [closed form, docs/sources.md#solver-oracles]
		double nvt = Physics.thermalVoltage(300);
		double exact = LambertW.diodeCurrent(5, 1e3, 1e-14, nvt);
		assertEquals(4.30745637e-3, exact, 1e-11); // our Lambert-W agrees with the published digits
		DcSolution s = seriesCircuit(5, 1e3, DiodeModel.SILICON);
		assertEquals(exact, s.device("D1").current(), exact * RELATIVE);
		assertEquals(5 - exact * 1e3, s.voltage("anode"), 1e-8);
	}

	@Test
	void seriesResistanceInsideTheModel() {
		// the same 1 kΩ as the diode's own Rs, the source straight across the diode
		double nvt = Physics.thermalVoltage(300);
		double exact = LambertW.diodeCurrent(5, 1e3, 1e-14, nvt);
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in");
		b.add(VoltageSource.ideal("V1", in, 0, 5)).diode("D1", in, 0, DiodeModel.SILICON.withSeriesOhms(1e3));
		DcSolution s = solve(b.build());
		assertEquals(exact, s.device("D1").current(), exact * RELATIVE);
		assertEquals(5.0, s.device("D1").voltage(), 1e-12); // pins are the outer terminals
	}

	@Test
	void sedraSmithIterativeProblem() {
		// 1 V, 1 kΩ, Is = 1e-15 A, VT = 25 mV → I = 0.336456623 mA, Vd = 0.663543377 V
		// [closed form; Sedra & Smith, Microelectronic Circuits, diode chapter problems, per docs/sources.md#solver-oracles]
		double kelvin = 0.025 * Physics.ELEMENTARY_CHARGE / Physics.BOLTZMANN; // the temperature where VT = 25 mV
		DiodeModel model = new DiodeModel(1e-15, 1, 0, Double.POSITIVE_INFINITY, 1e-3, 1, kelvin);
		double exact = LambertW.diodeCurrent(1, 1e3, 1e-15, 0.025);
		assertEquals(0.336456623e-3, exact, 1e-12);
		DcSolution s = seriesCircuit(1, 1e3, model);
		assertEquals(exact, s.device("D1").current(), exact * RELATIVE);
		assertEquals(0.663543377, s.device("D1").voltage(), 1e-8);
	}

	@Test
	void sedraSmithWorkedExample() {
		// 5 V, 1 kΩ, a diode of 1 mA at 0.7 V with 0.1 V per decade: Is = 1e-10 A, n·VT = 0.1/ln 10
		// → I = 4.2373 mA, Vd = 0.76271 V [closed form; example attribution unconfirmed, docs/sources.md#solver-oracles]
		double nvt = 0.1 / Math.log(10);
		double n = nvt / Physics.thermalVoltage(300);
		DiodeModel model = DiodeModel.SILICON.withSaturation(1e-10, n);
		double exact = LambertW.diodeCurrent(5, 1e3, 1e-10, nvt);
		assertEquals(4.2373e-3, exact, 1e-7);
		DcSolution s = seriesCircuit(5, 1e3, model);
		assertEquals(exact, s.device("D1").current(), exact * RELATIVE);
		assertEquals(0.76271, s.device("D1").voltage(), 1e-5);
	}

	@Test
	void reverseBiasLeavesOnlySaturationAndGmin() {
		// −12 V across 1 kΩ and the diode: I = −Is − GMIN·V (the junction takes nearly all of the 12 V)
		DcSolution s = seriesCircuit(-12, 1e3, DiodeModel.SILICON);
		double i = s.device("D1").current();
		assertTrue(i < 0 && i > -2e-11, "reverse current " + i);
		assertEquals(-12, s.device("D1").voltage(), 1e-6);
		assertEquals(12, s.device("D1").reverseVoltage("junction"), 1e-6);
	}

	@Test
	void zenerHoldsItsBreakdownVoltage() {
		// 12 V through 1 kΩ into the cathode of a 5.1 V zener (Ibv = 1 mA at BV). The solution must satisfy
		// both the resistor's and the diode's equations: (12 − Vz)/1k = −I(−Vz) [closed form, KCL]
		DiodeModel zener = DiodeModel.SILICON.withBreakdown(5.1, 1e-3);
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), k = b.net("k");
		b.add(VoltageSource.ideal("V1", in, 0, 12)).add(new Resistor("R1", in, k, 1e3));
		b.diode("Z1", 0, k, zener); // anode on the reference, cathode up: reverse-biased
		DcSolution s = solve(b.build());
		double vz = s.voltage("k");
		double resistorCurrent = (12 - vz) / 1e3;
		assertEquals(resistorCurrent, -zener.current(-vz), resistorCurrent * RELATIVE);
		// Ibv·exp((Vz − BV)/Vt) = I → Vz = BV + Vt·ln(I/Ibv): 6.9 mA is about 50 mV above BV
		assertEquals(5.1 + Physics.thermalVoltage(300) * Math.log(resistorCurrent / 1e-3), vz, 1e-6);
	}

	@Test
	void mainsPeakInBothPolarities() {
		// 253 V + 10 % … the IEC 60038 upper supply, 357.8 V peak [published + closed form, docs/sources.md#mains-and-surges],
		// across 100 kΩ and a silicon diode, both ways; then into a 100 V breakdown diode.
		double peak = 253 * Math.sqrt(2);
		assertEquals(357.80, peak, 0.01);
		double nvt = Physics.thermalVoltage(300);
		double forward = LambertW.diodeCurrent(peak, 100e3, 1e-14, nvt);
		assertEquals(forward, seriesCircuit(peak, 100e3, DiodeModel.SILICON).device("D1").current(), forward * RELATIVE);
		assertEquals(-peak, seriesCircuit(-peak, 100e3, DiodeModel.SILICON).device("D1").voltage(), 1e-3);
		DcSolution breakdown = seriesCircuit(-peak, 10e3, DiodeModel.SILICON.withBreakdown(100, 1e-3));
		double v = breakdown.device("D1").voltage();
		assertTrue(v < -100 && v > -100.3, "breakdown voltage " + v);
	}
}
