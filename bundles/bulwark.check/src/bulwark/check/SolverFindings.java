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
		String advice = failure.reason() == bulwark.engine.solve.SolveFailure.Reason.VOLTAGE_SOURCE_LOOP && part == null
				? idealAcross(compiled, c) : "";
		return Finding.of(CheckerRules.SOLVER, "case '" + c.name() + "' could not be solved (" + reason + "): "
				+ failure.message() + advice).about(part, c.name(), where);
	}

	/**
	 * A case's source across two terminals meets an ideal source of the design's own across the same nets: say
	 * which, and what mends it ("; V1 holds those terminals as an ideal source, and the case applies another
	 * across them: give it its internal resistance …").
	 */
	private static String idealAcross(CompiledDesign compiled, FaultCase c) {
		java.util.Set<String> nets = new java.util.HashSet<>();
		for (Member m : compiled.design().getMembers()) {
			if (m instanceof bulwark.lang.design.Terminal t && t.getName() != null && t.getNet() != null
					&& (t.getName().equals(c.from()) || t.getName().equals(c.to()))) {
				nets.add(t.getNet().getName());
			}
		}
		java.util.List<String> ideal = new java.util.ArrayList<>();
		for (bulwark.lang.design.Part p : compiled.parts().values()) {
			boolean source = p.getKind() == bulwark.lang.design.PartKind.SOURCE || p.getKind() == bulwark.lang.design.PartKind.BATTERY;
			if (source && nets.size() == 2 && p.getPins().stream().allMatch(b -> b.getNet() != null && nets.contains(b.getNet().getName()))
					&& bulwark.check.parts.Settings.parameter(p, "resistance").orElse(0.0) == 0) {
				ideal.add(p.getName());
			}
		}
		return ideal.isEmpty() ? "" : "; " + String.join(" and ", ideal) + (ideal.size() == 1 ? " holds" : " hold")
				+ " those terminals as an ideal source, and the case applies another across them: give "
				+ (ideal.size() == 1 ? "it its" : "each its") + " internal resistance (for example resistance 1 Ω)";
	}
}
