package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.device.DiodeModel;

/**
 * An open probe behind an LED and its antiparallel diode: the probe's nets reach the rest only through
 * junctions at zero bias. Found when a tester's "terminals open" case would not solve.
 */
class FloatingIslandTest {

	@Test
	void anOpenProbeBehindAntiparallelJunctionsSolves() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int cell = b.net("cell"), anode = b.net("anode"), probe = b.net("probe"), tip = b.net("tip");
		b.add(VoltageSource.ideal("V1", cell, 0, 3)).add(new Resistor("R1", cell, anode, 470));
		b.diode("LED", anode, probe, DiodeModel.led(1.9, 2));
		b.diode("D_ANTI", probe, anode, DiodeModel.SILICON);
		b.diode("D_CLAMP", tip, probe, DiodeModel.SILICON);
		b.add(new Resistor("R_TIP", probe, tip, 10));
		DcResult r = new DcSolver().solve(b.build());
		DcSolution s = assertInstanceOf(DcSolution.class, r, () -> "expected a solution, got " + r);
		// no path leaves the island, so no current flows and every net of it sits at the cell's 3 V
		// [closed form: KCL on the island; the 1 µV voltage tolerance of Nagel, ERL memo M520, bounds the answer]
		assertEquals(3, s.voltage("anode"), 1e-6);
		assertEquals(3, s.voltage("probe"), 1e-5);
		assertEquals(3, s.voltage("tip"), 1e-5);
		assertEquals(0, s.device("LED").current(), 1e-12);
	}
}
