package bulwark.fix;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.policy.ReviewPolicy;
import bulwark.lang.design.Design;

/** What a fix provider may look at: the text, its model, the check's result and policy, and the checker. */
public record FixContext(String text, String file, Design design, DesignResult result, ReviewPolicy policy,
		DesignChecker checker) {
}
