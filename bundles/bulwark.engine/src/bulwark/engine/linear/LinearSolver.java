package bulwark.engine.linear;

/**
 * Solves A·x = b for a square A. {@link #factor(double[][])} may overwrite the matrix it is given;
 * {@link #solve(double[], double[])} leaves b untouched. One factorisation serves many right-hand sides.
 */
public interface LinearSolver {
	/**
	 * Factors A. Returns false when A is singular to working precision; {@link #singularColumn()} then
	 * names the first column for which no usable pivot was found.
	 */
	boolean factor(double[][] a);

	/** Writes the solution of A·x = b into x. Only valid after a successful {@link #factor}. */
	void solve(double[] b, double[] x);

	/** Column index where factorisation broke down, or -1. */
	int singularColumn();
}
