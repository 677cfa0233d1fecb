package bulwark.engine.linear;

/**
 * LU decomposition with partial (row) pivoting, Doolittle form, for small dense systems.
 * Algorithm: Golub and Van Loan, Matrix Computations, 4th ed., §3.4 (Gaussian elimination with partial
 * pivoting). A pivot is treated as zero when it is below {@link #RELATIVE_PIVOT_TOLERANCE} times the
 * largest magnitude in the matrix, so that a floating sub-circuit is reported instead of solved into noise.
 */
public final class DenseLuSolver implements LinearSolver {
	/** Pivot threshold relative to the largest entry of A (a few hundred ulps of 1). */
	public static final double RELATIVE_PIVOT_TOLERANCE = 1e-13;

	private double[][] lu;
	private int[] permutation;
	private int singularColumn = -1;

	@Override
	public boolean factor(double[][] a) {
		int n = a.length;
		lu = a;
		permutation = new int[n];
		singularColumn = -1;
		double scale = 0;
		for (double[] row : a) {
			if (row.length != n) {
				throw new IllegalArgumentException("matrix is not square");
			}
			for (double v : row) {
				scale = Math.max(scale, Math.abs(v));
			}
		}
		double tiny = scale * RELATIVE_PIVOT_TOLERANCE;
		for (int i = 0; i < n; i++) {
			permutation[i] = i;
		}
		for (int k = 0; k < n; k++) {
			int pivotRow = k;
			double best = Math.abs(lu[k][k]);
			for (int i = k + 1; i < n; i++) {
				double v = Math.abs(lu[i][k]);
				if (v > best) {
					best = v;
					pivotRow = i;
				}
			}
			if (!(best > tiny)) {
				singularColumn = k;
				return false;
			}
			if (pivotRow != k) {
				double[] t = lu[k];
				lu[k] = lu[pivotRow];
				lu[pivotRow] = t;
				int p = permutation[k];
				permutation[k] = permutation[pivotRow];
				permutation[pivotRow] = p;
			}
			double pivot = lu[k][k];
			for (int i = k + 1; i < n; i++) {
				double factor = lu[i][k] / pivot;
				lu[i][k] = factor;
				if (factor != 0) {
					double[] rowI = lu[i];
					double[] rowK = lu[k];
					for (int j = k + 1; j < n; j++) {
						rowI[j] -= factor * rowK[j];
					}
				}
			}
		}
		return true;
	}

	@Override
	public void solve(double[] b, double[] x) {
		int n = lu.length;
		double[] y = new double[n];
		for (int i = 0; i < n; i++) {
			double s = b[permutation[i]];
			double[] row = lu[i];
			for (int j = 0; j < i; j++) {
				s -= row[j] * y[j];
			}
			y[i] = s;
		}
		for (int i = n - 1; i >= 0; i--) {
			double s = y[i];
			double[] row = lu[i];
			for (int j = i + 1; j < n; j++) {
				s -= row[j] * x[j];
			}
			x[i] = s / row[i];
		}
	}

	@Override
	public int singularColumn() {
		return singularColumn;
	}
}
