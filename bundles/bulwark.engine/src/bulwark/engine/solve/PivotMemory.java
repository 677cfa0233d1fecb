package bulwark.engine.solve;

import bulwark.engine.linear.SparseLu;

/**
 * The pivot order and L and U patterns of the last successful factorisation of a circuit's matrix,
 * kept for the next solve of the same pattern (the next point of a sweep, the next case with one part
 * replaced): its Newton run then starts with a numerical refactorisation instead of a pivot search.
 * Shared between threads: each solve takes a copy, and what is kept is a copy of its own.
 */
final class PivotMemory {
	private final int size;
	private final int[] order;
	private volatile SparseLu last;

	PivotMemory(int size, int[] order) {
		this.size = size;
		this.order = order;
	}

	/** A factorisation to run with, seeded with the kept pivots when there are any. */
	SparseLu fresh() {
		SparseLu kept = last;
		return kept == null ? new SparseLu(size, order) : new SparseLu(kept);
	}

	/** Keeps the pivots of a factorisation that succeeded. */
	void keep(SparseLu lu) {
		if (lu.factored()) {
			last = new SparseLu(lu);
		}
	}
}
