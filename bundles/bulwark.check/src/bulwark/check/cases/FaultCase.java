package bulwark.check.cases;

import java.util.List;
import java.util.Map;

import bulwark.engine.circuit.Device;

/**
 * A condition the design is solved under: the design as written, plus the devices the case adds at the
 * terminals, with some of its own devices replaced (a battery put in backwards). {@code from} and
 * {@code to} name the terminals a generated abuse case drives, positive at {@code from} (null otherwise).
 */
public record FaultCase(String name, CaseKind kind, List<Device> added, Map<String, Device> replaced, String from,
		String to, boolean momentary) {
	public FaultCase {
		added = List.copyOf(added);
		replaced = Map.copyOf(replaced);
	}

	public FaultCase(String name, CaseKind kind, List<Device> added) {
		this(name, kind, added, Map.of(), null, null);
	}

	/** A case that lasts as long as the circuit stays in it. */
	public FaultCase(String name, CaseKind kind, List<Device> added, Map<String, Device> replaced, String from,
			String to) {
		this(name, kind, added, replaced, from, to, false);
	}

	/**
	 * The same circuit for a moment only — until a fuse opens: its instantaneous stresses count, a thermal
	 * (power) rating does not, and what the moment costs a part is its energy (a pulse).
	 */
	public FaultCase momentarily(String newName) {
		return new FaultCase(newName, kind, added, replaced, from, to, true);
	}

	public static FaultCase normalOpen() {
		return new FaultCase("normal, terminals open", CaseKind.NORMAL, List.of());
	}

	/** Abuse at the terminals: a generated DC case, mains, a reversed battery or a surge. */
	public boolean isAbuse() {
		return kind.isAbuse();
	}

	/** Solved over a sine's cycle: mains, or a designer's case with a sine (see MainsRunner). */
	public boolean isMains() {
		return kind.overACycle();
	}

	public boolean isSurge() {
		return kind == CaseKind.SURGE;
	}

	/** The same case at one instant of its transient. */
	public FaultCase at(String instant) {
		return new FaultCase(name + ", at " + instant, kind, added, replaced, from, to, momentary);
	}

	/** The same case at one instant, named with the terminal positive then and the other. */
	public FaultCase at(String instant, String plus, String minus) {
		return new FaultCase(name + ", " + plus + " + to " + minus + " −, at " + instant, kind, added, replaced, plus,
				minus, momentary);
	}
}
