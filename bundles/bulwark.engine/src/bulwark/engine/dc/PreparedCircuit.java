package bulwark.engine.dc;

import bulwark.engine.circuit.Circuit;

/**
 * A circuit with its unknowns numbered, its matrix pattern found and its elimination order computed:
 * the symbolic work, done once and reused by every solve of the same circuit.
 */
public final class PreparedCircuit {
	final Layout layout;
	/** A fault of the circuit's structure that no arithmetic can overcome, found once here. */
	final SolveFailure structural;

	PreparedCircuit(Circuit circuit) {
		this.layout = new Layout(circuit);
		this.structural = circuit.devices().isEmpty()
				? new SolveFailure(SolveFailure.Reason.EMPTY_CIRCUIT, null, "the circuit has no devices")
				: TopologyCheck.check(circuit).orElse(null);
	}

	public Circuit circuit() {
		return layout.circuit;
	}

	/** Unknowns of the nodal equations (nets other than the reference, plus branch currents). */
	public int unknowns() {
		return layout.size;
	}

	/** Entries of the matrix pattern. */
	public int nonZeros() {
		return layout.pattern.nonZeros();
	}
}
