package bulwark.engine.solve;


import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;
import bulwark.engine.linear.SparseLu;
import bulwark.engine.mna.TransientStep;

/**
 * DC operating point by modified nodal analysis, solved with a sparse LU in a fill-reducing order, (Ho, Ruehli and Brennan, "The modified nodal approach to
 * network analysis", IEEE Trans. Circuits and Systems 22(6), 1975) and Newton–Raphson iteration on the
 * devices' companion models, with the fall-backs Nagel describes (ERL memo M520, 1975) when plain Newton
 * fails: gmin stepping, then source stepping. A circuit without nonlinear devices is solved in one step.
 * Every outcome is a value: a {@link DcSolution} or a {@link SolveFailure} naming reason and place.
 */
public final class DcSolver {
	/** Iterations after which each Newton step is halved, to break out of oscillation. */
	static final int DAMPING_AFTER = 60;
	/**
	 * Iterations after which the update may settle within the looser tolerances of Nagel's program (1 µV, 1 pA;
	 * ERL memo M520, 1975) instead of ours, the residual still having to be small. A net joined to the
	 * rest only through junctions at zero bias (a pair of antiparallel diodes with a floating probe behind
	 * them) is fixed by conductances of 1e-12 S against 0.1 S within its island: rounding moves it by tens of
	 * microvolts each step, so our nanovolt update test can never settle although KCL holds.
	 */
	static final int LOOSE_AFTER = 40;
	static final double LOOSE_RELATIVE = 1e-6;
	static final double LOOSE_VOLTAGE = 1e-6;
	static final double LOOSE_CURRENT = 1e-12;
	/** Largest conductance of gmin stepping, then divided by {@link #GMIN_FACTOR} down to {@link #GMIN_LAST}. */
	static final double GMIN_FIRST = 1e-2;
	static final double GMIN_LAST = 1e-12;
	static final double GMIN_FACTOR = 10;
	/** First and smallest step of source stepping, as fractions of the full source values. */
	static final double SOURCE_STEP_FIRST = 0.1;
	static final double SOURCE_STEP_SMALLEST = 1e-4;

	private final Tolerances tolerances;

	public DcSolver() {
		this(Tolerances.DEFAULT);
	}

	public DcSolver(Tolerances tolerances) {
		this.tolerances = tolerances;
	}

	/** Does the symbolic work for a circuit once, so that it can be solved many times. */
	public static PreparedCircuit prepare(Circuit circuit) {
		return new PreparedCircuit(circuit);
	}

	public DcResult solve(Circuit circuit) {
		return solve(prepare(circuit));
	}

	/** Solves a prepared circuit; its symbolic work is reused. */
	public DcResult solve(PreparedCircuit prepared) {
		return solve(prepared, null);
	}

	/**
	 * Solves a prepared circuit starting from a neighbouring solution (continuation: the previous point of a
	 * sweep), which keeps a circuit with hysteresis on the branch it was on. With no start, from zero.
	 */
	public DcResult solve(PreparedCircuit prepared, DcSolution start) {
		if (prepared.structural != null) {
			return prepared.structural;
		}
		Layout layout = prepared.layout;
		Circuit circuit = layout.circuit;
		Assembly assembly = new Assembly(layout);
		boolean nonlinear = circuit.devices().stream().anyMatch(Device::nonlinear);
		double[] zero = new double[layout.size];
		double[] first = start != null && start.unknowns.length == layout.size ? start.unknowns : zero;

		Attempt plain = newton(layout, assembly, first, 1, 0, nonlinear);
		if (plain.converged()) {
			return solution(layout, assembly, plain.x, plain.iterations, Strategy.NEWTON);
		}
		if (plain.singularAt >= 0 && !nonlinear) {
			return singular(layout, plain.singularAt);
		}
		int spent = plain.iterations;

		// gmin stepping: a conductance from every net to the reference makes the matrix diagonally dominant;
		// each solution seeds the next, smaller one, and the last run has none.
		double[] x = zero;
		boolean stepped = true;
		for (double g = GMIN_FIRST; g >= GMIN_LAST * 0.999; g /= GMIN_FACTOR) {
			Attempt a = newton(layout, assembly, x, 1, g, true);
			spent += a.iterations;
			if (!a.converged()) {
				stepped = false;
				break;
			}
			x = a.x;
		}
		if (stepped) {
			Attempt last = newton(layout, assembly, x, 1, 0, true);
			spent += last.iterations;
			if (last.converged()) {
				return solution(layout, assembly, last.x, spent, Strategy.GMIN_STEPPING);
			}
		}

		// source stepping: every independent source ramps from zero, each step starting from the last solution.
		x = zero;
		double scale = 0;
		double step = SOURCE_STEP_FIRST;
		while (scale < 1) {
			double next = Math.min(1, scale + step);
			Attempt a = newton(layout, assembly, x, next, 0, true);
			spent += a.iterations;
			if (a.converged()) {
				x = a.x;
				scale = next;
				step = Math.min(step * 2, 0.5);
			} else {
				step /= 4;
				if (step < SOURCE_STEP_SMALLEST) {
					break;
				}
			}
		}
		if (scale >= 1) {
			return solution(layout, assembly, x, spent, Strategy.SOURCE_STEPPING);
		}
		if (plain.singularAt >= 0) {
			return singular(layout, plain.singularAt);
		}
		String place = layout.place(plain.worst);
		return new SolveFailure(SolveFailure.Reason.NO_CONVERGENCE, place,
				"no convergence after " + spent + " iterations (Newton, gmin stepping, source stepping); "
						+ "the largest last change was at " + layout.describe(plain.worst));
	}

	/** One Newton–Raphson run from x0 with the sources scaled and gmin to the reference. */
	private Attempt newton(Layout layout, Assembly assembly, double[] x0, double scale, double nodeGmin,
			boolean nonlinear) {
		return newton(layout, assembly, x0, scale, nodeGmin, nonlinear, null);
	}

	/** One Newton–Raphson run; with a transient step, the reactive devices stamp their companion models. */
	Attempt newton(Layout layout, Assembly assembly, double[] x0, double scale, double nodeGmin, boolean nonlinear,
			TransientStep step) {
		int n = layout.size;
		double[] x = x0.clone();
		double[] xNew = new double[n];
		SparseLu lu = assembly.lu;
		assembly.resetStates();
		boolean updateSmall = false;
		boolean updateSettled = false;
		int worst = 0;
		for (int iteration = 1; iteration <= tolerances.maxIterations(); iteration++) {
			boolean clean = assembly.assemble(x, scale, nodeGmin, step);
			boolean settled = updateSmall || (iteration > LOOSE_AFTER && updateSettled);
			if (settled && clean && residualSmall(layout, assembly, x)) {
				assembly.keepPivots();
				return new Attempt(x, iteration - 1, -1, worst);
			}
			if (!lu.factor(assembly.matrix)) {
				return new Attempt(null, iteration, lu.singularColumn(), lu.singularColumn());
			}
			lu.solve(assembly.rhs, xNew);
			if (!nonlinear) {
				assembly.keepPivots();
				return new Attempt(xNew.clone(), 1, -1, 0);
			}
			double worstRatio = -1;
			updateSmall = true;
			updateSettled = true;
			for (int i = 0; i < n; i++) {
				if (!Double.isFinite(xNew[i])) {
					return new Attempt(null, iteration, -1, i);
				}
				double tol = tolerances.relative() * Math.max(Math.abs(xNew[i]), Math.abs(x[i]))
						+ (i < layout.nodes ? tolerances.voltage() : tolerances.current());
				double ratio = Math.abs(xNew[i] - x[i]) / tol;
				if (ratio > worstRatio) {
					worstRatio = ratio;
					worst = i;
				}
				updateSmall &= ratio <= 1;
				updateSettled &= Math.abs(xNew[i] - x[i]) <= LOOSE_RELATIVE * Math.max(Math.abs(xNew[i]), Math.abs(x[i]))
						+ (i < layout.nodes ? LOOSE_VOLTAGE : LOOSE_CURRENT);
			}
			if (iteration > DAMPING_AFTER) {
				for (int i = 0; i < n; i++) {
					xNew[i] = x[i] + 0.5 * (xNew[i] - x[i]);
				}
			}
			double[] t = x;
			x = xNew;
			xNew = t;
		}
		return new Attempt(null, tolerances.maxIterations(), -1, worst);
	}

	/** KCL (and branch equation) residual of the equations assembled at x, row by row. */
	private boolean residualSmall(Layout layout, Assembly assembly, double[] x) {
		int n = layout.size;
		double[] ax = new double[n];
		double[] scale = new double[n];
		assembly.matrix.multiply(x, ax);
		assembly.matrix.rowTermScale(x, scale);
		for (int i = 0; i < n; i++) {
			double sum = ax[i] - assembly.rhs[i];
			double rowScale = Math.max(scale[i], Math.abs(assembly.rhs[i]));
			double abs = i < layout.nodes ? tolerances.current() : tolerances.voltage();
			if (Math.abs(sum) > tolerances.relative() * rowScale + abs) {
				return false;
			}
		}
		return true;
	}

	private static SolveFailure singular(Layout layout, int column) {
		String place = layout.place(column);
		return new SolveFailure(SolveFailure.Reason.SINGULAR_MATRIX, place,
				"the nodal equations are singular at " + layout.describe(column));
	}

	static DcSolution solution(Layout layout, Assembly assembly, double[] x, int iterations, Strategy strategy) {
		Circuit circuit = layout.circuit;
		double[] v = new double[circuit.netCount()];
		System.arraycopy(x, 0, v, 1, layout.nodes);
		OperatingPoint[] points = new OperatingPoint[layout.devices.length];
		for (int i = 0; i < layout.devices.length; i++) {
			Device d = layout.devices[i];
			int[] pins = d.pins();
			double[] pinV = new double[pins.length];
			for (int p = 0; p < pins.length; p++) {
				pinV[p] = v[pins[p]];
			}
			double[] currents = d.pinCurrents(assembly.view(x, i));
			points[i] = new OperatingPoint(d.name(), shared(d.pinNames()), pinV, currents, shared(d.junctionNames()),
					d.reverseVoltages(assembly.view(x, i)));
		}
		return new DcSolution(circuit, v, points, iterations, strategy, x);
	}

	/** The few distinct arrays of pin and junction names, shared: every operating point of every case holds them. */
	private static final java.util.concurrent.ConcurrentHashMap<java.util.List<String>, String[]> NAMES = new java.util.concurrent.ConcurrentHashMap<>();

	private static String[] shared(String[] names) {
		return NAMES.computeIfAbsent(java.util.List.of(names), k -> names);
	}

	/** Outcome of one Newton run: x when converged, else where it broke down. */
	record Attempt(double[] x, int iterations, int singularAt, int worst) {
		boolean converged() {
			return x != null;
		}
	}
}
