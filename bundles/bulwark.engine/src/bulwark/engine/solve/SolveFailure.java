package bulwark.engine.solve;

/**
 * A solve that could not produce a trustworthy answer. {@code place} names the net or device where the
 * trouble is, so that it can be reported on the design text.
 */
public record SolveFailure(Reason reason, String place, String message) implements DcResult {

	public enum Reason {
		/** A net with no DC path to the reference net: its voltage is undefined. */
		FLOATING_NET,
		/** Ideal voltage sources (zero internal resistance) that form a loop, or one shorted on itself. */
		VOLTAGE_SOURCE_LOOP,
		/** The system matrix has no usable pivot although the topology looked sound. */
		SINGULAR_MATRIX,
		/** Newton's method, gmin stepping and source stepping all failed to converge. */
		NO_CONVERGENCE,
		/** A transient could not go on: Newton failed even at the smallest time step allowed. */
		TIMESTEP_TOO_SMALL,
		/** Under a periodic source, the state still changed from one period to the next after the most allowed. */
		NO_STEADY_STATE,
		/** The circuit has no device at all. */
		EMPTY_CIRCUIT
	}
}
