package bulwark.check.compile;

import bulwark.engine.dc.DcResult;

/** A case and what solving it gave: a solution or a failure. */
public record CaseOutcome(FaultCase faultCase, DcResult result) {
}
