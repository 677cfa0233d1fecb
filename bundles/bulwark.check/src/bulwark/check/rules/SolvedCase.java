package bulwark.check.rules;

import bulwark.check.compile.FaultCase;
import bulwark.engine.dc.DcSolution;

/** A case with its solved operating point. */
public record SolvedCase(FaultCase faultCase, DcSolution solution) {
}
