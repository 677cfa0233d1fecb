package bulwark.check.compile;

import java.util.List;
import java.util.Locale;

import bulwark.check.figures.Figures;
import bulwark.engine.circuit.Comparator;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.PreparedCircuit;

/**
 * A comparator whose output a DC solve leaves between its rails may sit at a balance point of a
 * positive-feedback loop, in+ = in−: a solution of the equations that no real circuit stays at, since any
 * disturbance runs away to a rail. Perturbation test: start the solve again from the same point with the
 * output at either rail. A stable point (negative feedback, a follower) is found again from both; an
 * unstable one gives two different saturated states, and the one on the side the circuit was on in the case
 * before is the one a real circuit reaches — at power-up, from rest, the low one.
 */
final class BalancePoints {
	/** An output within this fraction of its span from either rail is saturated, not balanced [common practice]. */
	static final double SATURATED = 0.05;

	/** The result, settled off any unstable balance point, and a note naming what was left (null when none). */
	record Settled(DcResult result, String note) {
	}

	private BalancePoints() {
	}

	static Settled settle(DcSolver solver, PreparedCircuit circuit, DcResult result, DcSolution before) {
		if (!(result instanceof DcSolution s)) {
			return new Settled(result, null);
		}
		StringBuilder notes = new StringBuilder();
		for (Device d : circuit.circuit().devices()) {
			if (!(d instanceof Comparator k)) {
				continue;
			}
			int[] p = k.pins(); // in_plus, in_minus, out, supply_plus, supply_minus
			double high = s.voltage(p[3]), low = s.voltage(p[4]), out = s.voltage(p[2]);
			double span = high - low;
			if (!(span > 0) || out < low + SATURATED * span || out > high - SATURATED * span) {
				continue;
			}
			DcResult up = fromRail(solver, circuit, s, p[2], high);
			DcResult down = fromRail(solver, circuit, s, p[2], low);
			if (!(up instanceof DcSolution u) || !(down instanceof DcSolution w)
					|| Math.abs(u.voltage(p[2]) - w.voltage(p[2])) < 0.5 * span) {
				continue; // found again from both sides: a stable point
			}
			boolean wasHigh = before != null && before.voltage(p[2]) > (before.voltage(p[3]) + before.voltage(p[4])) / 2;
			s = wasHigh ? u : w;
			notes.append(notes.length() == 0 ? "" : "; ").append(String.format(Locale.ROOT,
					"%s left the balance point its positive feedback cannot hold (out %s, in+ = in−) for the %s state %s",
					k.name(), Figures.engineering(out, "V"), wasHigh ? "high" : "low",
					before == null ? "reached from rest" : "it was in before"));
		}
		return new Settled(s, notes.length() == 0 ? null : notes.toString());
	}

	/**
	 * The circuit solved from the state it has with the output held at a rail: first with the output pinned
	 * there by a source (every other net then agrees with it, which a single nudged net would not — Newton
	 * would walk straight back to the balance), then released, starting from that state.
	 */
	private static DcResult fromRail(DcSolver solver, PreparedCircuit circuit, DcSolution at, int out, double rail) {
		DcResult held = solver.solve(DcSolver.prepare(circuit.circuit()
				.plus(List.of(new VoltageSource("output held at a rail", out, 0, rail, 0)))));
		if (!(held instanceof DcSolution h)) {
			return held;
		}
		return solver.solve(circuit, at.withNetVoltagesOf(h));
	}
}
