package bulwark.check.function;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.List;
import java.util.Optional;

import bulwark.check.compile.CompiledDesign;
import bulwark.engine.circuit.Diode;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.DcSweep;
import bulwark.engine.solve.PreparedCircuit;
import bulwark.engine.device.DiodeModel;
import bulwark.engine.device.LedColour;
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
	/** Points per decade of the sweeps kept for plots. */
	static final int CURVE_POINTS = 4;
	static final double RELATIVE = 1e-3;
	/** An LED under test is seen lit from this current [common practice: about 1 mA for an indicator LED]. */
	public static final double LED_LIT = 1e-3;
	/** Emission coefficient of an LED under test [unconfirmed: typical of visible LEDs, as DeviceModels]. */
	static final double LED_EMISSION = 2;
	/** Hours in a year of 365.25 days [docs/sources.md#batteries]. */
	public static final double HOURS_PER_YEAR = 8766;

	private FunctionAnalysis() {
	}

	/** @param open the solution of the normal case with the terminals open */
	public static FunctionFigures of(CompiledDesign design, DcSolution open) {
		return of(design, open, true);
	}

	/** @param voltages whether to sweep a voltage across each pair too (VoltageSwitching) */
	public static FunctionFigures of(CompiledDesign design, DcSolution open, boolean voltages) {
		Optional<IndicatorState> indicator = IndicatorState.of(design);
		List<String> problems = new ArrayList<>();
		List<Part> batteries = design.parts().values().stream().filter(p -> p.getKind() == PartKind.BATTERY).toList();
		List<PairFigures> pairs = new ArrayList<>();
		DcSolver solver = new DcSolver();
		for (Terminal[] pair : MeasuringPairs.of(design)) {
			bulwark.check.budget.Budget.checkpoint("the function figures across " + pair[0].getName() + " and " + pair[1].getName());
			String name = "resistance under test";
			int a = design.circuit().netIndex(pair[0].getNet().getName());
			int b = design.circuit().netIndex(pair[1].getNet().getName());
			PreparedCircuit prepared = DcSolver.prepare(design.circuit().plus(List.of(new Resistor(name, a, b, OPEN))));
			DcResult shorted = solver.solve(prepared.with(name, new Resistor(name, a, b, SHORT)));
			if (!(shorted instanceof DcSolution s)) {
				problems.add("the terminals " + pair[0].getName() + " and " + pair[1].getName() + " shorted: "
						+ ((bulwark.engine.solve.SolveFailure) shorted).message());
				continue;
			}
			double testCurrent = Math.abs(s.device(name).current());
			double openVolts = open.voltage(a) - open.voltage(b);
			Double shortedBattery = batteries.isEmpty() ? null : discharge(batteries, s);
			Double risingOhms = null, fallingOhms = null;
			List<SweepPoint> risingCurve = List.of(), fallingCurve = List.of();
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
						if (pairs.stream().allMatch(p -> p.rising().isEmpty())) {
							risingCurve = curve(sweep, name, indicator.get(), true);
							fallingCurve = curve(sweep, name, indicator.get(), false);
						}
					}
				}
			}
			VoltageSwitching forward = VoltageSwitching.NONE, reverse = VoltageSwitching.NONE;
			if (indicator.isPresent() && voltages) {
				forward = VoltageSwitching.of(design, indicator.get(), a, b);
				reverse = VoltageSwitching.of(design, indicator.get(), b, a);
			}
			pairs.add(new PairFigures(pair[0].getName(), pair[1].getName(), onWhenShorted, risingOhms, fallingOhms,
					testCurrent, openVolts, shortedBattery, ledsLit(solver, design, a, b, openVolts), risingCurve,
					fallingCurve, forward, reverse));
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
		Map<String, SwitchingSweep.Outcome> comparators = new LinkedHashMap<>();
		for (Part p : design.parts().values()) {
			if (p.getKind() == PartKind.COMPARATOR) {
				comparators.put(p.getName(), SwitchingSweep.of(design, p));
			}
		}
		return new FunctionFigures(indicator.map(IndicatorState::part).orElse(null), pairs, standby, life, comparators,
				problems);
	}

	/** A plot's worth of the sweep in one direction: {@link #CURVE_POINTS} points per decade, continuing. */
	private static List<SweepPoint> curve(DcSweep sweep, String name, IndicatorState indicator, boolean rising) {
		int n = (int) Math.round(Math.log10(OPEN / SHORT) * CURVE_POINTS);
		double[] values = new double[n + 1];
		for (int i = 0; i <= n; i++) {
			double x = Math.log10(SHORT) + (Math.log10(OPEN) - Math.log10(SHORT)) * i / n;
			values[rising ? i : n - i] = Math.pow(10, x);
		}
		List<SweepPoint> points = new ArrayList<>();
		for (DcSweep.Point p : sweep.run(values)) {
			if (p.result() instanceof DcSolution s) {
				points.add(new SweepPoint(p.value(), Math.abs(s.device(name).current()), indicator.on(s)));
			}
		}
		return points;
	}

	/**
	 * The colours of LED under test the terminals light: an LED of each colour, at the highest forward voltage
	 * of its range (the hardest to light), across the pair the way the open-circuit voltage forward-biases it,
	 * lit from {@link #LED_LIT}.
	 */
	private static List<String> ledsLit(DcSolver solver, CompiledDesign design, int a, int b, double openVolts) {
		List<String> lit = new ArrayList<>();
		if (Math.abs(openVolts) < 1e-3) {
			return lit;
		}
		int anode = openVolts > 0 ? a : b, cathode = openVolts > 0 ? b : a;
		String name = "LED under test";
		PreparedCircuit prepared = null;
		for (LedColour colour : LedColour.values()) {
			Diode led = new Diode(name, anode, cathode, anode, DiodeModel.led(colour.highest(), LED_EMISSION));
			prepared = prepared == null ? DcSolver.prepare(design.circuit().plus(List.of(led))) : prepared.with(name, led);
			if (solver.solve(prepared) instanceof DcSolution s && s.device(name).current() >= LED_LIT) {
				lit.add(colour.name().toLowerCase(java.util.Locale.ROOT));
			}
		}
		return lit;
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
