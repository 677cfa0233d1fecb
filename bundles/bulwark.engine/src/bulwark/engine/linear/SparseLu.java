package bulwark.engine.linear;

import java.util.Arrays;

/**
 * Sparse LU with partial pivoting, left-looking, column by column: each column of L and U comes from a
 * sparse triangular solve whose nonzero pattern is found by a depth-first search of L's graph first
 * (Gilbert and Peierls, "Sparse partial pivoting in time proportional to arithmetic operations", SIAM J.
 * Sci. Stat. Comput. 9(5), 1988; the layout follows Davis, Direct Methods for Sparse Linear Systems, SIAM
 * 2006, §6.3). Columns are taken in a fill-reducing order given once per circuit; rows are pivoted by
 * magnitude, preferring the diagonal while it is within {@link #DIAGONAL_PREFERENCE} of the largest
 * candidate, which keeps the fill of the ordering (Davis, §6.3, threshold partial pivoting).
 */
public final class SparseLu {
	/** A diagonal pivot is kept while |diagonal| ≥ this × the largest candidate in its column. */
	public static final double DIAGONAL_PREFERENCE = 1e-3;

	private final int n;
	private final int[] q;
	// L and U in compressed columns, grown as needed
	private int[] lp, li, up, ui;
	private double[] lx, ux;
	private final int[] pinv;
	private final double[] x;
	private final double[] y;
	private final int[] xi;
	private final int[] stack;
	private final int[] position;
	private final int[] mark;
	private int generation;
	private int singularColumn = -1;
	/** True once a full factorisation has fixed the pivots and the patterns of L and U. */
	private boolean factored;
	private int pivotSearches;
	/** Scratch in pivot order for {@link #refactor}. */
	private final double[] work;

	/** @param columnOrder the elimination order of the columns (for example {@link MinimumDegree#order}) */
	public SparseLu(int n, int[] columnOrder) {
		this.n = n;
		this.q = columnOrder.clone();
		pinv = new int[n];
		x = new double[n];
		y = new double[n];
		xi = new int[n];
		stack = new int[n];
		position = new int[n];
		work = new double[n];
		mark = new int[n];
		lp = new int[n + 1];
		up = new int[n + 1];
		li = new int[4 * n + 16];
		lx = new double[li.length];
		ui = new int[4 * n + 16];
		ux = new double[ui.length];
	}

	/**
	 * A factorisation that starts from the pivots and the L and U patterns of another of the same matrix
	 * pattern and column order (an earlier solve of the same circuit), so that its first {@link #factor} is a
	 * numerical refactorisation; it pivots afresh if a reused pivot has become small, as every refactorisation does.
	 */
	public SparseLu(SparseLu pivotsOf) {
		this(pivotsOf.n, pivotsOf.q);
		if (pivotsOf.factored) {
			System.arraycopy(pivotsOf.pinv, 0, pinv, 0, n);
			System.arraycopy(pivotsOf.lp, 0, lp, 0, n + 1);
			System.arraycopy(pivotsOf.up, 0, up, 0, n + 1);
			if (pivotsOf.li.length != li.length) { // the other's factors outgrew the first size
				li = new int[pivotsOf.li.length];
				lx = new double[li.length];
			}
			if (pivotsOf.ui.length != ui.length) {
				ui = new int[pivotsOf.ui.length];
				ux = new double[ui.length];
			}
			System.arraycopy(pivotsOf.li, 0, li, 0, li.length);
			System.arraycopy(pivotsOf.ui, 0, ui, 0, ui.length);
			factored = true;
		}
	}

	/** True once a factorisation succeeded, so that its pivots can seed another's. */
	public boolean factored() {
		return factored;
	}

	/** How many times this factorisation chose its pivots afresh (0 when it only ever refactored). */
	public int pivotSearches() {
		return pivotSearches;
	}

	/**
	 * Factors A (not modified), reusing the pivots and the patterns of the last factorisation when it can
	 * (A's pattern is the same at every Newton iterate), and pivoting afresh when a reused pivot has
	 * become small. False when no usable pivot was found; see {@link #singularColumn()}.
	 */
	public boolean factor(CscMatrix a) {
		if (factored && refactor(a)) {
			return true;
		}
		pivotSearches++;
		factored = fullFactor(a);
		return factored;
	}

	/**
	 * Numerical refactorisation with the previous pivot order and patterns (Davis, Direct Methods for Sparse Linear Systems, §6.3, numerical refactorisation): no
	 * search of L's graph and no pivot search. Refuses (returns false) when a pivot falls below
	 * {@link #DIAGONAL_PREFERENCE} × the largest entry of its column, so that stability is never traded.
	 */
	private boolean refactor(CscMatrix a) {
		for (int k = 0; k < n; k++) {
			int col = q[k];
			for (int p = a.colStart[col]; p < a.colStart[col + 1]; p++) {
				work[pinv[a.rowIndex[p]]] = a.values[p];
			}
			int uEnd = up[k + 1] - 1; // the pivot is the last entry of U's column
			for (int p = up[k]; p < uEnd; p++) { // U's rows in ascending pivot order
				int j = ui[p];
				double xj = work[j];
				ux[p] = xj;
				work[j] = 0;
				for (int l = lp[j] + 1; l < lp[j + 1]; l++) {
					work[li[l]] -= lx[l] * xj;
				}
			}
			double pivot = work[k];
			work[k] = 0;
			double largest = Math.abs(pivot);
			for (int l = lp[k] + 1; l < lp[k + 1]; l++) {
				largest = Math.max(largest, Math.abs(work[li[l]]));
			}
			if (!(Math.abs(pivot) > 0) || Math.abs(pivot) < DIAGONAL_PREFERENCE * largest) {
				for (int l = lp[k] + 1; l < lp[k + 1]; l++) {
					work[li[l]] = 0;
				}
				return false;
			}
			ux[uEnd] = pivot;
			for (int l = lp[k] + 1; l < lp[k + 1]; l++) {
				lx[l] = work[li[l]] / pivot;
				work[li[l]] = 0;
			}
		}
		return true;
	}

	private boolean fullFactor(CscMatrix a) {
		Arrays.fill(pinv, -1);
		singularColumn = -1;
		int lnz = 0, unz = 0;
		for (int k = 0; k < n; k++) {
			lp[k] = lnz;
			up[k] = unz;
			if (lnz + n > li.length) {
				li = Arrays.copyOf(li, 2 * li.length + n);
				lx = Arrays.copyOf(lx, li.length);
			}
			if (unz + n > ui.length) {
				ui = Arrays.copyOf(ui, 2 * ui.length + n);
				ux = Arrays.copyOf(ux, ui.length);
			}
			int col = q[k];
			// a pivot counts as zero when it is negligible against its own column of A: a relative test
			// against the whole matrix would refuse well-posed systems whose columns differ in scale by
			// more than 1e13 (a transient's 2L/h beside a megohm's conductance)
			double columnMax = 0;
			for (int p = a.colStart[col]; p < a.colStart[col + 1]; p++) {
				columnMax = Math.max(columnMax, Math.abs(a.values[p]));
			}
			double tiny = columnMax * DenseLuSolver.RELATIVE_PIVOT_TOLERANCE;
			int top = solveColumn(a, col);
			int ipiv = -1;
			double largest = -1;
			for (int p = top; p < n; p++) {
				int i = xi[p];
				if (pinv[i] < 0) {
					double t = Math.abs(x[i]);
					if (t > largest) {
						largest = t;
						ipiv = i;
					}
				} else {
					ui[unz] = pinv[i];
					ux[unz++] = x[i];
				}
			}
			if (ipiv < 0 || !(largest > tiny)) {
				singularColumn = col;
				clear(top);
				return false;
			}
			if (pinv[col] < 0 && Math.abs(x[col]) >= largest * DIAGONAL_PREFERENCE) {
				ipiv = col;
			}
			double pivot = x[ipiv];
			ui[unz] = k;
			ux[unz++] = pivot;
			pinv[ipiv] = k;
			li[lnz] = ipiv;
			lx[lnz++] = 1;
			for (int p = top; p < n; p++) {
				int i = xi[p];
				if (pinv[i] < 0) {
					li[lnz] = i;
					lx[lnz++] = x[i] / pivot;
				}
				x[i] = 0;
			}
		}
		lp[n] = lnz;
		up[n] = unz;
		for (int p = 0; p < lnz; p++) {
			li[p] = pinv[li[p]];
		}
		sortUColumns();
		return true;
	}

	/** Puts each U column's off-diagonal rows in ascending pivot order, the order refactor() needs. */
	private void sortUColumns() {
		for (int k = 0; k < n; k++) {
			int from = up[k], to = up[k + 1] - 1;
			for (int i = from + 1; i < to; i++) { // insertion sort: columns are short
				int r = ui[i];
				double v = ux[i];
				int j = i - 1;
				while (j >= from && ui[j] > r) {
					ui[j + 1] = ui[j];
					ux[j + 1] = ux[j];
					j--;
				}
				ui[j + 1] = r;
				ux[j + 1] = v;
			}
		}
	}

	/** Writes the solution of A·x = b into out. Only valid after a successful {@link #factor}. */
	public void solve(double[] b, double[] out) {
		for (int k = 0; k < n; k++) {
			y[pinv[k]] = b[k];
		}
		for (int j = 0; j < n; j++) { // L·z = y, unit diagonal first in each column
			double yj = y[j];
			for (int p = lp[j] + 1; p < lp[j + 1]; p++) {
				y[li[p]] -= lx[p] * yj;
			}
		}
		for (int j = n - 1; j >= 0; j--) { // U·w = z, the pivot last in each column
			y[j] /= ux[up[j + 1] - 1];
			double yj = y[j];
			for (int p = up[j]; p < up[j + 1] - 1; p++) {
				y[ui[p]] -= ux[p] * yj;
			}
		}
		for (int k = 0; k < n; k++) {
			out[q[k]] = y[k];
		}
	}

	/** Original column where factorisation broke down, or −1. */
	public int singularColumn() {
		return singularColumn;
	}

	/** Nonzeros of L and U of the last factorisation, a measure of fill. */
	public int factorNonZeros() {
		return lp[n] + up[n];
	}

	/** x = L \ A(:, col) over the rows pivoted so far; returns the start of the pattern in xi[top … n−1]. */
	private int solveColumn(CscMatrix a, int col) {
		int top = reach(a, col);
		for (int p = top; p < n; p++) {
			x[xi[p]] = 0;
		}
		for (int p = a.colStart[col]; p < a.colStart[col + 1]; p++) {
			x[a.rowIndex[p]] = a.values[p];
		}
		for (int px = top; px < n; px++) {
			int j = xi[px];
			int jj = pinv[j];
			if (jj < 0) {
				continue;
			}
			double xj = x[j]; // L has a unit diagonal
			for (int p = lp[jj] + 1; p < lp[jj + 1]; p++) {
				x[li[p]] -= lx[p] * xj;
			}
		}
		return top;
	}

	/** Nonzero pattern of L \ A(:, col) in topological order, by depth-first search from A's nonzeros. */
	private int reach(CscMatrix a, int col) {
		generation++;
		if (generation == Integer.MAX_VALUE) {
			Arrays.fill(mark, 0);
			generation = 1;
		}
		int top = n;
		for (int p = a.colStart[col]; p < a.colStart[col + 1]; p++) {
			int start = a.rowIndex[p];
			if (mark[start] != generation) {
				top = depthFirst(start, top);
			}
		}
		return top;
	}

	private int depthFirst(int start, int top) {
		int head = 0;
		stack[0] = start;
		while (head >= 0) {
			int j = stack[head];
			int jj = pinv[j];
			if (mark[j] != generation) {
				mark[j] = generation;
				position[head] = jj < 0 ? 0 : lp[jj] + 1;
			}
			boolean done = true;
			int end = jj < 0 ? 0 : lp[jj + 1];
			for (int p = position[head]; p < end; p++) {
				int i = li[p];
				if (mark[i] == generation) {
					continue;
				}
				position[head] = p + 1;
				stack[++head] = i;
				done = false;
				break;
			}
			if (done) {
				head--;
				xi[--top] = j;
			}
		}
		return top;
	}

	private void clear(int top) {
		for (int p = top; p < n; p++) {
			x[xi[p]] = 0;
		}
	}
}
