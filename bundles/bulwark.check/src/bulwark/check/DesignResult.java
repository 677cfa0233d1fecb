package bulwark.check;

import java.util.List;

/** Everything the check found about one design file. */
public record DesignResult(String file, String title, Status status, List<Finding> findings, List<CaseResult> cases) {
	public DesignResult {
		findings = List.copyOf(findings);
		cases = List.copyOf(cases);
	}

	public long errorCount() {
		return findings.stream().filter(f -> f.severity() == Severity.ERROR && !f.waived()).count();
	}
}
