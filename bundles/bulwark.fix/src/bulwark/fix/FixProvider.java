package bulwark.fix;

import java.util.List;

import bulwark.check.finding.Finding;
import bulwark.check.fix.Fix;

/** Proposes fixes for one finding; the proposals are checked by {@link QuickFixes} before any is offered. */
public interface FixProvider {
	List<Fix> propose(FixContext context, Finding finding);
}
