package bulwark.engine.circuit;

import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;
import bulwark.engine.mna.TransientStep;

/**
 * A device of the compiled circuit. It names its pins (net indices, in the order of {@link #pinNames()}),
 * adds itself to the nodal equations, and reports the current into each pin at a solution.
 * Devices are immutable; anything that changes between Newton iterations lives in {@link Stamp#state()}.
 */
public interface Device {
	/** The designator the device came from, used to report results and failures. */
	String name();

	/** Nets of the external pins. */
	int[] pins();

	/** Names of the external pins, as the design language writes them. */
	String[] pinNames();

	/** Nets the device uses internally (for example behind a series resistance); not reported. */
	default int[] internalNets() {
		return new int[0];
	}

	/** Number of branch currents the device adds as unknowns (voltage sources, ideal wires). */
	default int branchCount() {
		return 0;
	}

	/** Number of doubles of per-solve memory the device needs. */
	default int stateSize() {
		return 0;
	}

	/** True when the device's equations depend on the solution (exponential junctions, switches). */
	default boolean nonlinear() {
		return false;
	}

	/** True when the device fixes a voltage between its pins without resistance (for the loop check). */
	default boolean idealVoltage() {
		return false;
	}

	/** True when the device conducts at DC between its pins (false for current sources and capacitors). */
	default boolean conductsAtDc() {
		return true;
	}

	/**
	 * Groups of pin indices (into {@link #pins()}) that the device joins at DC by more than a junction's
	 * leakage; a pin in no group is held only by leakage (a CMOS comparator's input). By default a device
	 * that conducts at DC joins all its pins.
	 */
	default int[][] firmlyJoinedPins() {
		if (!conductsAtDc()) {
			return new int[0][];
		}
		int[] all = new int[pins().length];
		for (int i = 0; i < all.length; i++) {
			all[i] = i;
		}
		return new int[][] { all };
	}

	/** Number of doubles a reactive device keeps from one accepted time point to the next. */
	default int historySize() {
		return 0;
	}

	/**
	 * Records the device's values at an accepted point: the operating point that starts a transient
	 * ({@code step} null) or the end of an accepted time step.
	 */
	default void accept(SolutionView x, double[] history, TransientStep step) {
	}

	/**
	 * The quantity a reactive device integrates (a capacitor's voltage, an inductor's current) at a
	 * solution, whose local truncation error limits the time step; NaN for devices that integrate nothing.
	 */
	default double integrated(SolutionView x) {
		return Double.NaN;
	}

	/** Names of the device's pn junctions whose reverse voltage a rating limits ("junction", "base-emitter"…). */
	default String[] junctionNames() {
		return new String[0];
	}

	/** Reverse voltage of each junction at a solution (positive when reverse-biased), in junctionNames() order. */
	default double[] reverseVoltages(SolutionView x) {
		return new double[0];
	}

	void stamp(Stamp s);

	/** Current into each external pin at a solution (they sum to zero). */
	double[] pinCurrents(SolutionView x);
}
