package bulwark.check.function;

import java.util.List;
import java.util.Optional;
import java.util.function.Predicate;

import bulwark.check.compile.CompiledDesign;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.DcSweep;
import bulwark.engine.solve.PreparedCircuit;
import bulwark.lang.design.Part;
import bulwark.lang.design.Terminal;

/**
 * Where a comparator switches as the resistance across a pair of terminals is swept: rising from a short
 * and falling from an open circuit, each from the last solution (so each sweep stays on its branch and the
 * two can differ by the hysteresis), bisected to {@link #RELATIVE} of the value. Also the step of the
 * comparator's differential input when its output switches: the distance the input must travel back, which
 * is the hysteresis at the input.
 */
public final class SwitchingSweep {
	/** Sweep range of the resistance under test, Ω: a short to an open circuit for any probe input. */
	static final double LOWEST = 1e-2, HIGHEST = 1e8;
	/** Geometric steps over the range before bisection (two per decade; bisection does the rest). */
	static final int STEPS = 20;
	/** Bisection ends at this relative width: 0.1 %. */
	static final double RELATIVE = 1e-3;

	/** The thresholds found across one terminal pair. */
	public record Result(String from, String to, double risingOhms, double fallingOhms, double inputStepVolts) {
		/** 0 where the two switching points agree within the sweeps' resolution (see {@link Resolution}). */
		public double hysteresisOhms() {
			return Resolution.beyond(risingOhms, fallingOhms, RELATIVE);
		}
	}

	/** The outcome: thresholds, or nothing found (empty with no failure), or why the sweep could not run. */
	public record Outcome(Optional<Result> result, String failure) {
	}

	private SwitchingSweep() {
	}

	/** Tries the measuring pairs (each terminal with the common one, else every pair) until one switches. */
	public static Outcome of(CompiledDesign design, Part comparator) {
		List<Terminal[]> pairs = MeasuringPairs.of(design);
		for (Terminal[] pair : pairs) {
			Outcome o = across(design, comparator, pair[0], pair[1]);
			if (o.result().isPresent() || o.failure() != null) {
				return o;
			}
		}
		return new Outcome(Optional.empty(), null);
	}

	static Outcome across(CompiledDesign design, Part comparator, Terminal a, Terminal b) {
		String name = "resistance under test";
		int na = design.circuit().netIndex(a.getNet().getName()), nb = design.circuit().netIndex(b.getNet().getName());
		DcSolver solver = new DcSolver();
		PreparedCircuit prepared = DcSolver.prepare(design.circuit().plus(List.of(new Resistor(name, na, nb, LOWEST))));
		DcSweep sweep = new DcSweep(solver, prepared, name, r -> new Resistor(name, na, nb, r));
		String c = comparator.getName();
		Predicate<DcSolution> high = s -> {
			var p = s.device(c);
			return p.pinVoltage("out") > (p.pinVoltage("supply_plus") + p.pinVoltage("supply_minus")) / 2;
		};
		// a pair across which the comparator does not switch ends the same at both ends: two solves, not a sweep
		DcResult shortEnd = solver.solve(prepared.with(name, new Resistor(name, na, nb, LOWEST)));
		DcResult openEnd = solver.solve(prepared.with(name, new Resistor(name, na, nb, HIGHEST)));
		if (shortEnd instanceof DcSolution s1 && openEnd instanceof DcSolution s2 && high.test(s1) == high.test(s2)) {
			return new Outcome(Optional.empty(), null);
		}
		DcSweep.Threshold rising = sweep.threshold(LOWEST, HIGHEST, STEPS, high, RELATIVE);
		if (rising.failure() != null) {
			return new Outcome(Optional.empty(), rising.failure().message());
		}
		DcSweep.Threshold falling = sweep.threshold(HIGHEST, LOWEST, STEPS, high, RELATIVE);
		if (falling.failure() != null) {
			return new Outcome(Optional.empty(), falling.failure().message());
		}
		if (rising.value().isEmpty() || falling.value().isEmpty()) {
			return new Outcome(Optional.empty(), null);
		}
		double r = rising.value().get();
		// just before and just after the rising threshold, walked up to from the short along the sweep's own
		// grid and closer steps, so that the point before stays on the branch the rising sweep was on (a jump
		// from the short straight to the threshold can land on the other branch, and the step read is nothing)
		double[] path = approach(r);
		List<DcSweep.Point> points = sweep.run(path);
		DcResult before = points.get(path.length - 2).result(), after = points.get(path.length - 1).result();
		if (!(before instanceof DcSolution sb) || !(after instanceof DcSolution sa)) {
			return new Outcome(Optional.empty(), "no solution beside the threshold");
		}
		if (high.test(sb) == high.test(sa)) {
			return new Outcome(Optional.empty(), String.format(java.util.Locale.ROOT,
					"%s did not switch between the two points beside its threshold (%.6g Ω), so its hysteresis is unknown",
					c, r));
		}
		double step = Math.abs(differential(sa, c) - differential(sb, c));
		return new Outcome(Optional.of(new Result(a.getName(), b.getName(), r, falling.value().get(), step)), null);
	}

	/** The short, the sweep's grid below the threshold, closer steps up to it, and the two points beside it. */
	static double[] approach(double threshold) {
		List<Double> path = new java.util.ArrayList<>();
		double ratio = Math.pow(HIGHEST / LOWEST, 1.0 / STEPS);
		double below = threshold * (1 - 2 * RELATIVE);
		for (double v = LOWEST; v < threshold * 0.7; v *= ratio) {
			path.add(v);
		}
		for (double gap : new double[] { 0.3, 0.1, 0.03, 0.01 }) {
			if (threshold * (1 - gap) > LOWEST) {
				path.add(threshold * (1 - gap));
			}
		}
		path.add(Math.max(below, LOWEST));
		path.add(threshold * (1 + 2 * RELATIVE));
		return path.stream().mapToDouble(Double::doubleValue).toArray();
	}

	private static double differential(DcSolution s, String comparator) {
		var p = s.device(comparator);
		return p.pinVoltage("in_plus") - p.pinVoltage("in_minus");
	}
}
