package bulwark.check.compile;

import java.util.List;
import java.util.Map;

import bulwark.engine.circuit.Device;

/**
 * A condition the design is solved under: the design as written, plus the devices the case adds at the
 * terminals, with some of its own devices replaced (a battery put in backwards). {@code from} and
 * {@code to} name the terminals a generated abuse case drives, positive at {@code from} (null otherwise).
 */
public record FaultCase(String name, String kind, List<Device> added, Map<String, Device> replaced, String from,
		String to) {
	public static final String NORMAL = "normal";
	public static final String DESIGNER = "designer";
	public static final String ABUSE = "abuse";
	/** A combination-wave surge, solved as a transient; its figures are taken at the instants of peak stress. */
	public static final String SURGE = "surge";
	/**
	 * Mains across a pair of terminals as the sine it is, solved over its cycle; its figures are taken at the
	 * instants of peak stress, power as the average over the cycle (see MainsRunner).
	 */
	public static final String MAINS = "mains";
	/** A designer's case with a sine among its actions, solved over its cycle as mains is. */
	public static final String DESIGNER_SINE = "designer sine";

	public FaultCase {
		added = List.copyOf(added);
		replaced = Map.copyOf(replaced);
	}

	public FaultCase(String name, String kind, List<Device> added) {
		this(name, kind, added, Map.of(), null, null);
	}

	public static FaultCase normalOpen() {
		return new FaultCase("normal, terminals open", NORMAL, List.of());
	}

	/** Abuse at the terminals: a generated DC case, mains, a reversed battery or a surge. */
	public boolean isAbuse() {
		return ABUSE.equals(kind) || SURGE.equals(kind) || MAINS.equals(kind);
	}

	/** Solved over a sine's cycle: mains, or a designer's case with a sine (see MainsRunner). */
	public boolean isMains() {
		return MAINS.equals(kind) || DESIGNER_SINE.equals(kind);
	}

	public boolean isSurge() {
		return SURGE.equals(kind);
	}

	/** The same case at one instant of its transient. */
	public FaultCase at(String instant) {
		return new FaultCase(name + ", at " + instant, kind, added, replaced, from, to);
	}

	/** The same case at one instant, named with the terminal positive then and the other. */
	public FaultCase at(String instant, String plus, String minus) {
		return new FaultCase(name + ", " + plus + " + to " + minus + " −, at " + instant, kind, added, replaced, plus,
				minus);
	}
}
