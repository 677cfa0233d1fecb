package bulwark.engine.solve;

import java.util.Arrays;

import bulwark.engine.linear.CscMatrix;

/**
 * Where each device's stamp calls land in the matrix's value array, in the order the device makes them,
 * recorded once by the pattern's dry run. An assembly replays a device's calls against its own stretch of
 * the plan, so that a stamp costs an array read instead of a search of the column; a call that differs
 * from the plan (a device whose order of calls depends on its state) is searched for, and only that
 * device's later calls of the same assembly pay for it.
 */
final class StampPlan {
	private int[] rows = new int[64], cols = new int[64];
	private int[] slots;
	private int length;
	/** Start of device i's stretch; deviceStart[i + 1] is its end. */
	final int[] deviceStart;

	StampPlan(int devices) {
		deviceStart = new int[devices + 1];
	}

	void beginDevice(int device) {
		deviceStart[device] = length;
	}

	void add(int row, int col) {
		if (length == rows.length) {
			rows = Arrays.copyOf(rows, 2 * length);
			cols = Arrays.copyOf(cols, 2 * length);
		}
		rows[length] = row;
		cols[length++] = col;
	}

	/** Ends the recording: every call's slot in the finished pattern. */
	void resolve(CscMatrix pattern) {
		deviceStart[deviceStart.length - 1] = length;
		slots = new int[length];
		for (int i = 0; i < length; i++) {
			slots[i] = pattern.slot(rows[i], cols[i]);
		}
	}

	/** The slot of call {@code index} of the plan if it is (row, col), else −1. */
	int slotIf(int index, int row, int col) {
		return rows[index] == row && cols[index] == col ? slots[index] : -1;
	}
}
