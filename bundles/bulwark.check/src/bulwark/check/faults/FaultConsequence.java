package bulwark.check.faults;

import bulwark.check.stress.Overstress;

/** What one fault does: another part over its absolute rating in a case, or a case that cannot be solved. */
public record FaultConsequence(Fault fault, String caseName, Overstress overstress, String unsolved) {
	public static FaultConsequence over(Fault fault, String caseName, Overstress o) {
		return new FaultConsequence(fault, caseName, o, null);
	}

	public static FaultConsequence unsolvable(Fault fault, String caseName, String reason) {
		return new FaultConsequence(fault, caseName, null, reason);
	}

	/** How far over its rating, 1 = at it; infinite for a case that cannot be solved (never a pass). */
	public double severity() {
		return overstress == null ? Double.POSITIVE_INFINITY : overstress.utilisation();
	}
}
