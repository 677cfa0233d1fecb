package bulwark.check;

import java.util.List;

import bulwark.check.function.FunctionFigures;
import bulwark.check.finding.Finding;
import bulwark.check.finding.FindingDetail;
import bulwark.check.finding.FindingsCap;
import bulwark.check.finding.Severity;
import bulwark.check.cases.CaseResult;

/**
 * Everything the check found about one design file: its findings, each case's figures, the review policy
 * it was checked under (null when it was not checked), each part's worst stress per rating, the function
 * figures at the terminals, and for each waveform case the trace of the part it stresses most.
 */
public record DesignResult(String file, String title, Status status, List<Finding> findings, List<CaseResult> cases,
		String policy, List<WorstStress> stresses, FunctionFigures function, List<WaveformTrace> waveforms) {
	public DesignResult {
		findings = FindingsCap.of(List.copyOf(findings));
		cases = List.copyOf(cases);
		stresses = List.copyOf(stresses);
		waveforms = List.copyOf(waveforms);
	}

	/** A result with no waveform cases. */
	public DesignResult(String file, String title, Status status, List<Finding> findings, List<CaseResult> cases,
			String policy, List<WorstStress> stresses, FunctionFigures function) {
		this(file, title, status, findings, cases, policy, stresses, function, List.of());
	}

	/** A result with no stresses: a design that was not checked. */
	public DesignResult(String file, String title, Status status, List<Finding> findings, List<CaseResult> cases) {
		this(file, title, status, findings, cases, null, List.of(), FunctionFigures.NONE);
	}

	public long errorCount() {
		return count(Severity.ERROR);
	}

	/** Unwaived findings of a severity, the ones a capped list leaves out included. */
	public long count(Severity severity) {
		long n = 0;
		for (Finding f : findings) {
			if (f.detail() instanceof FindingDetail.Omitted o) {
				n += severity == Severity.ERROR ? o.errors() : severity == Severity.WARNING ? o.warnings() : o.infos();
			} else if (f.severity() == severity && !f.waived()) {
				n++;
			}
		}
		return n;
	}
}
