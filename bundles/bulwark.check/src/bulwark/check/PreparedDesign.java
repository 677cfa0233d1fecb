package bulwark.check;

import java.util.List;

import bulwark.check.compile.CompiledDesign;
import bulwark.check.load.LoadedDesign;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.finding.Finding;

/**
 * A design through the stages every use of it shares — read within the input limits, parsed and validated
 * without errors, its review policy chosen, compiled — and ready to be solved, checked or varied.
 *
 * @param findings the language's warnings and notes, which every later result carries on
 */
public record PreparedDesign(LoadedDesign loaded, ReviewPolicy policy, CompiledDesign compiled, List<Finding> findings) {
	public PreparedDesign {
		findings = List.copyOf(findings);
	}

	public String file() {
		return loaded.file();
	}
}
