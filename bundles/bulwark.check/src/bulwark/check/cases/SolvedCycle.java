package bulwark.check.cases;

import java.util.List;

import bulwark.engine.solve.DcSolution;

/**
 * The solved points of one cycle of a waveform case, with their times from the cycle's start, s, and how the
 * cycle was found ("quasi-static sweep of 36 operating points", "transient analysis, steady after 3 periods").
 */
public record SolvedCycle(List<Double> seconds, List<DcSolution> points, String method) {
	public SolvedCycle {
		seconds = List.copyOf(seconds);
		points = List.copyOf(points);
	}
}
