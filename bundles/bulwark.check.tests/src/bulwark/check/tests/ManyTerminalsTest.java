package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.Status;
import bulwark.check.WaveformTrace;
import bulwark.check.cases.CaseResult;
import bulwark.check.cases.PartStress;
import bulwark.check.policy.DefaultPolicy;

/**
 * A design with many terminals has a mains case for every pair of them and every mains system. Each pair's
 * cycle is its own case, named for its pair, and of the cycles only the 24 that stress their most stressed
 * part most are kept for plotting: the others would be thousands of plots nobody reads.
 */
class ManyTerminalsTest {
	/** Twelve terminals: a common one and eleven inputs, each through its own resistor (1 kΩ apart). */
	private static String design() {
		StringBuilder s = new StringBuilder("design \"Twelve inputs\"\npurpose \"Many pairs of terminals\"\nrevision \"A\"\n"
				+ "reference net gnd\nterminal G \"ground\" at gnd common\n");
		for (int i = 1; i <= 11; i++) {
			s.append("net n").append(i).append("\nterminal T").append(i).append(" \"input ").append(i).append("\" at n")
					.append(i).append("\nresistor R").append(i).append(" (a: n").append(i).append(", b: gnd) {\n  value ")
					.append(100 + i).append(" kΩ ± 1 %\n  rated power 1 W\n  rated voltage 500 V\n  package 2512\n}\n");
		}
		return s.toString();
	}

	@Test
	void eachPairHasItsOwnCycleAndOnlyTheMostStressingArePlotted() {
		DesignResult r = Fixtures.checkAllowingTrouble(design(), DefaultPolicy.POLICY);
		assertTrue(r.status() == Status.PASS || r.status() == Status.FAIL, () -> r.status() + " " + r.findings());
		// the whole cycles: one per pair of the 12 terminals (66) and mains system, each named for its pair
		Map<String, Double> cycles = new HashMap<>();
		for (CaseResult c : r.cases()) {
			if (c.name().contains(" mains (") && c.name().contains(", between ")) {
				double most = c.parts().stream().filter(p -> p.utilisation() != null).mapToDouble(PartStress::utilisation)
						.max().orElseThrow();
				assertEquals(null, cycles.put(c.name(), most), () -> "two cycles named " + c.name());
			}
		}
		int systems = DefaultPolicy.POLICY.mains().size();
		assertEquals(66 * systems, cycles.size(), () -> cycles.keySet().toString());
		List<WaveformTrace> plotted = r.waveforms();
		assertEquals(24, plotted.size());
		Set<String> kept = plotted.stream().map(WaveformTrace::caseName).collect(Collectors.toSet());
		assertEquals(24, kept.size(), kept::toString);
		double leastKept = kept.stream().mapToDouble(cycles::get).min().orElseThrow();
		double mostDropped = cycles.entrySet().stream().filter(e -> !kept.contains(e.getKey()))
				.mapToDouble(Map.Entry::getValue).max().orElseThrow();
		assertTrue(leastKept >= mostDropped, leastKept + " kept, " + mostDropped + " dropped");
	}
}
