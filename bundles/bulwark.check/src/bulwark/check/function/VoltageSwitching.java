package bulwark.check.function;

import java.util.List;

import bulwark.check.compile.CompiledDesign;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.DcSweep;
import bulwark.engine.solve.PreparedCircuit;

/**
 * Where the indicator of a voltage indicator or logic input comes on as a DC voltage across a pair of terminals
 * rises from {@link #LOWEST} to {@link #HIGHEST}, and where it goes off again as the voltage falls back, each
 * sweep from the last solution (so a design with hysteresis stays on its branch), stepped and bisected as the
 * threshold resistance is (FunctionAnalysis's steps, to 0.1 %). Null where it does not switch within the range; {@code problem} says why a sweep
 * could not run.
 */
public record VoltageSwitching(Double onVolts, Double offVolts, String problem) {
	/**
	 * The sweep's range, V: from well below any indicator's switching point to 1 kV, the highest voltage
	 * hand-held testers are rated for [common practice, docs/sources.md#tester-inputs].
	 */
	public static final double LOWEST = 0.1, HIGHEST = 1000;

	static final VoltageSwitching NONE = new VoltageSwitching(null, null, null);

	/** The switching points with {@code plus} the positive terminal's net and {@code minus} the other's. */
	static VoltageSwitching of(CompiledDesign design, IndicatorState indicator, int plus, int minus) {
		String name = "voltage under test";
		DcSolver solver = new DcSolver();
		PreparedCircuit prepared = DcSolver.prepare(design.circuit()
				.plus(List.of(new VoltageSource(name, plus, minus, LOWEST, 0))));
		// already on at the bottom of the range (a continuity tester, to which the source is a short): it is not
		// switched on by a voltage, and there is no switching point to give
		if (solver.solve(prepared) instanceof DcSolution low && indicator.on(low)) {
			return NONE;
		}
		DcSweep sweep = new DcSweep(solver, prepared, name, v -> new VoltageSource(name, plus, minus, v, 0));
		DcSweep.Threshold rising = sweep.threshold(LOWEST, HIGHEST, FunctionAnalysis.STEPS, indicator::on, FunctionAnalysis.RELATIVE);
		if (rising.failure() != null) {
			return new VoltageSwitching(null, null, rising.failure().message());
		}
		if (rising.value().isEmpty()) {
			return NONE;
		}
		DcSweep.Threshold falling = sweep.threshold(HIGHEST, LOWEST, FunctionAnalysis.STEPS, indicator::on, FunctionAnalysis.RELATIVE);
		if (falling.failure() != null) {
			return new VoltageSwitching(rising.value().get(), null, falling.failure().message());
		}
		return new VoltageSwitching(rising.value().get(), falling.value().orElse(null), null);
	}
}
