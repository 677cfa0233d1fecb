package bulwark.engine.linear;

import java.util.BitSet;

/** Collects the (row, column) places of a sparse matrix, then builds it with every diagonal entry present. */
public final class PatternBuilder {
	private final int n;
	private final BitSet[] columns;

	public PatternBuilder(int n) {
		this.n = n;
		columns = new BitSet[n];
		for (int j = 0; j < n; j++) {
			columns[j] = new BitSet();
			columns[j].set(j); // diagonal always present: gmin stepping and pivoting may use it
		}
	}

	public void add(int row, int col) {
		columns[col].set(row);
	}

	public CscMatrix build() {
		int[] colStart = new int[n + 1];
		for (int j = 0; j < n; j++) {
			colStart[j + 1] = colStart[j] + columns[j].cardinality();
		}
		int[] rowIndex = new int[colStart[n]];
		for (int j = 0; j < n; j++) {
			int p = colStart[j];
			for (int i = columns[j].nextSetBit(0); i >= 0; i = columns[j].nextSetBit(i + 1)) {
				rowIndex[p++] = i;
			}
		}
		return new CscMatrix(n, colStart, rowIndex);
	}
}
