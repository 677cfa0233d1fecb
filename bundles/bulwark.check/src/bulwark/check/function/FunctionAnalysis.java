package bulwark.check.function;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import bulwark.check.compile.CompiledDesign;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.dc.DcResult;
import bulwark.engine.dc.DcSolution;
import bulwark.engine.dc.DcSolver;
import bulwark.engine.dc.DcSweep;
import bulwark.engine.dc.PreparedCircuit;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.lang.design.Terminal;

/**
 * Computes the function figures from the engine: a resistance across each measuring pair, from a short
 * ({@link #SHORT}) to an open circuit ({@link #OPEN}); the indicator's switching points found by
 * continuation sweeps up and down, bisected to {@link #RELATIVE} (0.1 %); the test current into the short;
 * the open-circuit voltage and the battery's standby current from the normal open case.
 */
public final class FunctionAnalysis {
	/** A short across the terminals, Ω [closed form: far below any probe or lead resistance]. */
	static final double SHORT = 1e-3;
	/** An open circuit across the terminals, Ω. */
	static final double OPEN = 1e9;
	static final int STEPS = 24;
	static final double RELATIVE = 1e-3;
	/** Hours in a year of 365.25 days [sources.md]. */
	public static final double HOURS_PER_YEAR = 8766;

	private FunctionAnalysis() {
	}

	/** @param open the solution of the normal case with the terminals open */
	public static FunctionFigures of(CompiledDesign design, DcSolution open) {
		Optional<IndicatorState> indicator = IndicatorState.of(design);
		List<String> problems = new ArrayList<>();
		List<Part> batteries = design.parts().values().stream().filter(p -> p.getKind() == PartKind.BATTERY).toList();
		List<PairFigures> pairs = new ArrayList<>();
		DcSolver solver = new DcSolver();
		for (Terminal[] pair : MeasuringPairs.of(design)) {
			String name = "resistance under test";
			int a = design.circuit().netIndex(pair[0].getNet().getName());
			int b = design.circuit().netIndex(pair[1].getNet().getName());
			PreparedCircuit prepared = DcSolver.prepare(design.circuit().plus(List.of(new Resistor(name, a, b, OPEN))));
			DcResult shorted = solver.solve(prepared.with(name, new Resistor(name, a, b, SHORT)));
			if (!(shorted instanceof DcSolution s)) {
				problems.add("the terminals " + pair[0].getName() + " and " + pair[1].getName() + " shorted: "
						+ ((bulwark.engine.dc.SolveFailure) shorted).message());
				continue;
			}
			double testCurrent = Math.abs(s.device(name).current());
			double openVolts = open.voltage(a) - open.voltage(b);
			Double shortedBattery = batteries.isEmpty() ? null : discharge(batteries, s);
			Double risingOhms = null, fallingOhms = null;
			boolean onWhenShorted = indicator.isPresent() && indicator.get().on(s);
			if (indicator.isPresent()) {
				DcResult opened = solver.solve(prepared);
				if (opened instanceof DcSolution o && indicator.get().on(o) != indicator.get().on(s)) {
					DcSweep sweep = new DcSweep(solver, prepared, name, r -> new Resistor(name, a, b, r));
					DcSweep.Threshold rising = sweep.threshold(SHORT, OPEN, STEPS, indicator.get()::on, RELATIVE);
					DcSweep.Threshold falling = sweep.threshold(OPEN, SHORT, STEPS, indicator.get()::on, RELATIVE);
					if (rising.failure() != null || falling.failure() != null) {
						problems.add("the threshold sweep across " + pair[0].getName() + " and " + pair[1].getName()
								+ ": " + (rising.failure() != null ? rising.failure() : falling.failure()).message());
					} else {
						risingOhms = rising.value().orElse(null);
						fallingOhms = falling.value().orElse(null);
					}
				}
			}
			pairs.add(new PairFigures(pair[0].getName(), pair[1].getName(), onWhenShorted, risingOhms, fallingOhms,
					testCurrent, openVolts, shortedBattery));
		}
		Double standby = batteries.isEmpty() ? null : discharge(batteries, open);
		Double life = null;
		for (Part battery : batteries) {
			Optional<Double> coulombs = design.values().parameter(battery, "capacity");
			double amps = Math.max(0, -open.device(battery.getName()).current());
			if (coulombs.isPresent()) {
				double hours = amps > 0 ? coulombs.get() / amps / 3600 : Double.POSITIVE_INFINITY;
				life = life == null ? hours : Math.min(life, hours);
			}
		}
		return new FunctionFigures(indicator.map(IndicatorState::part).orElse(null), pairs, standby, life, problems);
	}

	/** Current the batteries deliver (out of their positive pins). */
	private static double discharge(List<Part> batteries, DcSolution s) {
		double amps = 0;
		for (Part battery : batteries) {
			amps += Math.max(0, -s.device(battery.getName()).current());
		}
		return amps;
	}
}
