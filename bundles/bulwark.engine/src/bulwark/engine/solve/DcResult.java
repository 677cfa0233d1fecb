package bulwark.engine.solve;

/** What a DC solve ends in: a solution, or a failure that names its reason and place. Never an exception. */
public sealed interface DcResult permits DcSolution, SolveFailure {
	default boolean converged() {
		return this instanceof DcSolution;
	}
}
