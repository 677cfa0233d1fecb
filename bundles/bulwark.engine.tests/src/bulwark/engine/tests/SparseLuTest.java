package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;

import org.junit.jupiter.api.Test;

import bulwark.engine.linear.CscMatrix;
import bulwark.engine.linear.DenseLuSolver;
import bulwark.engine.linear.MinimumDegree;
import bulwark.engine.linear.SparseLu;

/**
 * The sparse LU against the dense one and against known solutions: random sparse systems, MNA-shaped
 * systems with zero diagonals (branch rows of voltage sources), singular and near-singular matrices.
 */
class SparseLuTest {
	private static final long SEED = 7L;
	/** Agreement of two backward-stable solves of well-conditioned systems. */
	private static final double RELATIVE = 1e-10;

	private static double[] sparseSolve(double[][] a, double[] b) {
		CscMatrix m = CscMatrix.fromDense(a);
		SparseLu lu = new SparseLu(a.length, MinimumDegree.order(m));
		assertTrue(lu.factor(m), "sparse factorisation failed");
		double[] x = new double[a.length];
		lu.solve(b, x);
		return x;
	}

	private static double[] denseSolve(double[][] a, double[] b) {
		double[][] copy = new double[a.length][];
		for (int i = 0; i < a.length; i++) {
			copy[i] = a[i].clone();
		}
		DenseLuSolver lu = new DenseLuSolver();
		assertTrue(lu.factor(copy));
		double[] x = new double[a.length];
		lu.solve(b, x);
		return x;
	}

	@Test
	void knownSolution() {
		// 2x + y = 3, x + 3y = 5 → x = 0.8, y = 1.4 [closed form, Cramer's rule]
		double[] x = sparseSolve(new double[][] { { 2, 1 }, { 1, 3 } }, new double[] { 3, 5 });
		assertArrayEquals(new double[] { 0.8, 1.4 }, x, 1e-15);
	}

	@Test
	void zeroDiagonalNeedsPivoting() {
		// MNA shape: a 1 kΩ resistor from net 1 to ground and a 5 V source on net 1 (branch row has a 0 diagonal)
		double[][] a = { { 1e-3, 1 }, { 1, 0 } };
		double[] x = sparseSolve(a, new double[] { 0, 5 });
		assertEquals(5, x[0], 1e-15);
		assertEquals(-5e-3, x[1], 1e-18);
	}

	@Test
	void randomSparseSystemsAgreeWithDense() {
		Random random = new Random(SEED);
		for (int trial = 0; trial < 200; trial++) {
			int n = 1 + random.nextInt(60);
			double[][] a = new double[n][n];
			for (int i = 0; i < n; i++) {
				a[i][i] = random.nextBoolean() ? 1 + 10 * random.nextDouble() : 0;
				for (int k = 0; k < 3; k++) {
					int j = random.nextInt(n);
					a[i][j] += random.nextGaussian();
					a[j][i] += random.nextGaussian();
				}
				a[i][random.nextInt(n)] += 5; // keeps most systems comfortably regular
			}
			double[] b = random.doubles(n, -1, 1).toArray();
			DenseLuSolver probe = new DenseLuSolver();
			double[][] copy = Arrays.stream(a).map(double[]::clone).toArray(double[][]::new);
			if (!probe.factor(copy)) {
				continue; // a singular draw; singularity has its own test
			}
			double[] expected = denseSolve(a, b);
			double[] actual = sparseSolve(a, b);
			double scale = Arrays.stream(expected).map(Math::abs).max().orElse(1);
			double[] residual = residual(a, actual, b);
			for (int i = 0; i < n; i++) {
				assertEquals(0, residual[i], 1e-9 * (1 + scale), "residual, trial " + trial);
			}
			if (scale < 1e6) { // compare solutions only where the system is not ill-conditioned
				for (int i = 0; i < n; i++) {
					assertEquals(expected[i], actual[i], RELATIVE * 1e3 * (1 + scale), "trial " + trial);
				}
			}
		}
	}

	@Test
	void refactorWithNewValuesOnTheSamePattern() {
		// Newton refills the same pattern: the second factorisation reuses the pivots and must still be exact
		Random random = new Random(SEED + 1);
		int n = 30;
		double[][] a = new double[n][n];
		for (int i = 0; i < n; i++) {
			a[i][i] = 4;
			a[i][(i + 1) % n] = -1;
			a[(i + 7) % n][i] = -1;
		}
		CscMatrix m = CscMatrix.fromDense(a);
		SparseLu lu = new SparseLu(n, MinimumDegree.order(m));
		assertTrue(lu.factor(m));
		for (int round = 0; round < 20; round++) {
			double[][] b = new double[n][n];
			m.clear();
			for (int i = 0; i < n; i++) {
				for (int j = 0; j < n; j++) {
					if (a[i][j] != 0) {
						// round 10 makes the diagonal tiny: the old pivots are then refused and chosen afresh
						b[i][j] = a[i][j] * (0.5 + random.nextDouble()) * (i == j && round == 10 ? 1e-9 : 1);
						m.addAt(m.slot(i, j), b[i][j]);
					}
				}
			}
			double[] rhs = random.doubles(n, -1, 1).toArray();
			assertTrue(lu.factor(m), "round " + round);
			double[] x = new double[n];
			lu.solve(rhs, x);
			assertArrayEquals(denseSolve(b, rhs), x, 1e-9, "round " + round);
		}
	}

	@Test
	void singularMatrixIsReported() {
		double[][] a = { { 1, 2, 0 }, { 2, 4, 0 }, { 0, 0, 1 } };
		CscMatrix m = CscMatrix.fromDense(a);
		SparseLu lu = new SparseLu(3, new int[] { 0, 1, 2 });
		assertFalse(lu.factor(m));
		assertEquals(1, lu.singularColumn());
	}

	@Test
	void nearSingularBelowThePivotThresholdIsReported() {
		double[][] a = { { 1, 1 }, { 1, 1 + 1e-15 } };
		assertFalse(new SparseLu(2, new int[] { 0, 1 }).factor(CscMatrix.fromDense(a)));
	}

	@Test
	void minimumDegreeKeepsALadderFree() {
		// A tridiagonal (ladder) matrix in any minimum-degree order factors with no fill: nnz(L+U) = nnz(A) + n
		int n = 200;
		double[][] a = new double[n][n];
		for (int i = 0; i < n; i++) {
			a[i][i] = 4;
			if (i > 0) {
				a[i][i - 1] = a[i - 1][i] = -1;
			}
		}
		CscMatrix m = CscMatrix.fromDense(a);
		SparseLu lu = new SparseLu(n, MinimumDegree.order(m));
		assertTrue(lu.factor(m));
		assertEquals(m.nonZeros() + n, lu.factorNonZeros()); // L's unit diagonal is stored
	}

	private static double[] residual(double[][] a, double[] x, double[] b) {
		double[] r = new double[b.length];
		for (int i = 0; i < b.length; i++) {
			double s = -b[i];
			for (int j = 0; j < b.length; j++) {
				s += a[i][j] * x[j];
			}
			r[i] = s;
		}
		return r;
	}
}
