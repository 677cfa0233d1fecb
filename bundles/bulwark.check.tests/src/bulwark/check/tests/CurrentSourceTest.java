package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.Status;
import bulwark.engine.solve.DcSolution;

/** A `current_source` drives its current out of plus: 1 mA into 1 kΩ stands at 1 V [Ohm's law]. */
class CurrentSourceTest {
	private static final String DESIGN = """
			design "a test current"
			reference net gnd
			net a
			current_source I1 (plus: a, minus: gnd) { current 1 mA }
			resistor R1 (a: a, b: gnd) { value 1 kΩ rated power 250 mW package 0805 }
			""";

	@Test
	void itsCurrentLeavesByPlus() {
		DcSolution s = (DcSolution) Fixtures.outcomes(DESIGN).get(0).result();
		assertEquals(1.0, s.voltage("a"), 1e-9);
		assertEquals(1e-3, s.device("R1").current(), 1e-12);
		DesignResult r = Fixtures.check(DESIGN);
		assertNotEquals(Status.ERROR, r.status(), r.findings().toString());
	}
}
