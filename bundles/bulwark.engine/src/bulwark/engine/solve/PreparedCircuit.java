package bulwark.engine.solve;

import java.util.Arrays;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;

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
				: TopologyCheck.check(circuit).or(() -> TopologyCheck.heldOnlyByLeakage(circuit)).orElse(null);
	}

	private PreparedCircuit(Layout layout, SolveFailure structural) {
		this.layout = layout;
		this.structural = structural;
	}

	/**
	 * The same circuit with one device replaced by another of the same kind on the same pins (a swept
	 * value, a part at a tolerance corner): the symbolic work is shared, since the stamps land on the same
	 * places.
	 */
	public PreparedCircuit with(String device, Device replacement) {
		Circuit circuit = layout.circuit;
		int index = circuit.deviceIndex(device);
		if (index < 0) {
			throw new IllegalArgumentException("no device named " + device);
		}
		Device old = circuit.devices().get(index);
		if (old.getClass() != replacement.getClass() || !Arrays.equals(old.pins(), replacement.pins())
				|| !Arrays.equals(old.internalNets(), replacement.internalNets())
				|| old.branchCount() != replacement.branchCount() || old.stateSize() != replacement.stateSize()) {
			throw new IllegalArgumentException(device + " can only be replaced by the same kind on the same pins");
		}
		return new PreparedCircuit(layout.withCircuit(circuit.withDevice(index, replacement)), structural);
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
