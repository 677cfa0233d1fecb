package bulwark.engine.linear;

import java.util.Arrays;

/**
 * A square sparse matrix in compressed-column form: the rows of column j are rowIndex[colStart[j] …
 * colStart[j+1]−1], sorted, with their values beside them. The pattern is fixed once built; only the values
 * change (the circuit's stamps land on the same places at every iterate).
 */
public final class CscMatrix {
	final int n;
	final int[] colStart;
	final int[] rowIndex;
	final double[] values;

	CscMatrix(int n, int[] colStart, int[] rowIndex) {
		this.n = n;
		this.colStart = colStart;
		this.rowIndex = rowIndex;
		this.values = new double[rowIndex.length];
	}

	public int size() {
		return n;
	}

	public int nonZeros() {
		return rowIndex.length;
	}

	/** Position of entry (row, col) in the value array, or −1 when it is not in the pattern. */
	public int slot(int row, int col) {
		int lo = colStart[col], hi = colStart[col + 1] - 1;
		while (lo <= hi) {
			int mid = (lo + hi) >>> 1;
			int r = rowIndex[mid];
			if (r < row) {
				lo = mid + 1;
			} else if (r > row) {
				hi = mid - 1;
			} else {
				return mid;
			}
		}
		return -1;
	}

	public void addAt(int slot, double value) {
		values[slot] += value;
	}

	public void clear() {
		Arrays.fill(values, 0);
	}

	/** y = A·x. */
	public void multiply(double[] x, double[] y) {
		Arrays.fill(y, 0, n, 0);
		for (int j = 0; j < n; j++) {
			double xj = x[j];
			for (int p = colStart[j]; p < colStart[j + 1]; p++) {
				y[rowIndex[p]] += values[p] * xj;
			}
		}
	}

	/** For each row, the largest |A(i,j)·x(j)|: the scale against which a row's residual is judged. */
	public void rowTermScale(double[] x, double[] scale) {
		Arrays.fill(scale, 0, n, 0);
		for (int j = 0; j < n; j++) {
			for (int p = colStart[j]; p < colStart[j + 1]; p++) {
				scale[rowIndex[p]] = Math.max(scale[rowIndex[p]], Math.abs(values[p] * x[j]));
			}
		}
	}

	/** The same pattern with its own values, for a copy that a solver may keep. */
	public CscMatrix copy() {
		CscMatrix c = new CscMatrix(n, colStart, rowIndex);
		System.arraycopy(values, 0, c.values, 0, values.length);
		return c;
	}

	/** A dense matrix's nonzeros (and its diagonal) as a sparse one; for tests and small cases. */
	public static CscMatrix fromDense(double[][] a) {
		PatternBuilder pattern = new PatternBuilder(a.length);
		for (int i = 0; i < a.length; i++) {
			for (int j = 0; j < a.length; j++) {
				if (a[i][j] != 0 || i == j) {
					pattern.add(i, j);
				}
			}
		}
		CscMatrix m = pattern.build();
		for (int i = 0; i < a.length; i++) {
			for (int j = 0; j < a.length; j++) {
				if (a[i][j] != 0) {
					m.addAt(m.slot(i, j), a[i][j]);
				}
			}
		}
		return m;
	}
}
