package bulwark.check;

import bulwark.check.cases.FaultCase;
import bulwark.check.compile.CompiledDesign;
import bulwark.check.finding.CheckerRules;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Locations;
import bulwark.check.finding.SourceLocation;
import bulwark.engine.solve.SolveFailure;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Member;

/** The finding for a case that could not be solved, located where the designer can act on it. */
final class SolverFindings {
	private SolverFindings() {
	}

	/**
	 * Where a case that failed without a place of its own comes from, so that no solver finding sits at 0:0:
	 * the designer's case of that name, else the terminal a generated case drives, else the design's title.
	 */
	private static SourceLocation caseOrigin(CompiledDesign compiled, FaultCase c) {
		SourceLocation terminal = null;
		for (Member m : compiled.design().getMembers()) {
			if (m instanceof bulwark.lang.design.Case && c.name().equals(m.getName())) {
				return Locations.of(m, DesignPackage.Literals.MEMBER__NAME);
			}
			if (terminal == null && m instanceof bulwark.lang.design.Terminal && m.getName() != null
					&& (m.getName().equals(c.from()) || m.getName().equals(c.to()))) {
				terminal = Locations.of(m, DesignPackage.Literals.MEMBER__NAME);
			}
		}
		return terminal != null ? terminal : Locations.of(compiled.design(), DesignPackage.Literals.DOCUMENT__TITLE);
	}

	static Finding of(CompiledDesign compiled, FaultCase c, SolveFailure failure) {
		SourceLocation where = SourceLocation.NONE;
		String part = null;
		if (failure.place() != null) {
			if (compiled.parts().containsKey(failure.place())) {
				part = failure.place();
				where = Locations.of(compiled.parts().get(part), DesignPackage.Literals.MEMBER__NAME);
			} else {
				for (Member m : compiled.design().getMembers()) {
					// a net by its name, or a case by the devices it adds ("case NAME #k")
					if (failure.place().equals(m.getName())
							|| m instanceof bulwark.lang.design.Case && failure.place().startsWith("case " + m.getName() + " #")) {
						where = Locations.of(m, DesignPackage.Literals.MEMBER__NAME);
					}
				}
			}
		}
		if (where.equals(SourceLocation.NONE)) {
			where = caseOrigin(compiled, c);
		}
		String reason = failure.reason().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
		return Finding.of(CheckerRules.SOLVER, "case '" + c.name() + "' could not be solved (" + reason + "): "
				+ failure.message()).about(part, c.name(), where);
	}
}
