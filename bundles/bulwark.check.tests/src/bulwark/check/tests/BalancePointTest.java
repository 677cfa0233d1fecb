package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


import org.junit.jupiter.api.Test;

import bulwark.check.cases.CaseOutcome;
import bulwark.engine.solve.DcSolution;

/**
 * A Schmitt trigger balanced exactly at its threshold — 10 kΩ under test against the 10 kΩ pull-up puts the
 * tip at 1.5 V, the reference — has a solution with out = 1.5 V and in+ = in−, which its positive feedback
 * cannot hold. The check reports the state the circuit reaches instead: from the open terminals, where the tip
 * is high, the output stays high, in+ = 1.5 V + 1.5 V·100 kΩ/1.1 MΩ = 1.636 V above the reference [closed form,
 * divider], and the case says so.
 */
class BalancePointTest {
	private static final String BALANCED = HysteresisRuleTest.SCHMITT.replace(" #! hysteresis", "")
			+ "case \"probe on 10 kΩ\" { connect 10 kΩ from TIP to COM }\n";

	@Test
	void anUnstableBalanceIsLeftForTheStateTheCircuitReaches() {
		CaseOutcome probe = Fixtures.outcomes(BALANCED).stream().filter(o -> o.faultCase().name().startsWith("probe on 10 kΩ"))
				.findFirst().orElseThrow();
		DcSolution s = (DcSolution) probe.result();
		var u1 = s.device("U1");
		assertTrue(u1.pinVoltage("out") > 2.9, "out " + u1.pinVoltage("out"));
		assertEquals(1.5 + 1.5 * 100e3 / 1.1e6, u1.pinVoltage("in_plus"), 0.01);
		assertTrue(probe.faultCase().name().contains("U1 left the balance point"), probe.faultCase().name());
	}

	@Test
	void aStableOperatingPointIsLeftAlone() {
		// the open terminals: the output is at a rail, nothing to settle, the case keeps its name
		CaseOutcome open = Fixtures.outcomes(BALANCED).get(0);
		assertTrue(!open.faultCase().name().contains("balance point"), open.faultCase().name());
		assertTrue(((DcSolution) open.result()).device("U1").pinVoltage("out") > 2.9);
	}
}
