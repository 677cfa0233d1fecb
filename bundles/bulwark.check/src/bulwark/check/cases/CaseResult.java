package bulwark.check.cases;

import java.util.List;

/** The outcome of one case: whether it solved, and every part's figures when it did. */
public record CaseResult(String name, String kind, boolean converged, List<PartStress> parts) {
	public CaseResult {
		parts = List.copyOf(parts);
	}
}
