package bulwark.check.cases;

import java.util.List;

import bulwark.engine.solve.DcSolution;

/** The solved points of one cycle of a waveform case, with their times from the cycle's start, s. */
public record SolvedCycle(List<Double> seconds, List<DcSolution> points) {
	public SolvedCycle {
		seconds = List.copyOf(seconds);
		points = List.copyOf(points);
	}
}
