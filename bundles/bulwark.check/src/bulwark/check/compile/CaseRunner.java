package bulwark.check.compile;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import bulwark.check.budget.Budget;
import bulwark.check.policy.ReviewPolicy;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.Fuse;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.PreparedCircuit;
import bulwark.check.cases.FaultCase;
import bulwark.check.cases.CaseOutcome;
import bulwark.check.parts.FuseRatings;

/**
 * Solves a compiled design in each of its cases. Cases that add the same devices on the same nets (both
 * polarities and every level across one pair of terminals) share one prepared circuit, so the symbolic work
 * is done once per pair; the mains and surge cases, each a run of many solves, share the machine's cores. A
 * fuse carrying more than its rated current opens: the case is solved again with it open, which is what the
 * rest of the circuit has to survive.
 */
public final class CaseRunner {
	/** An open fuse: a gap that still lets the solver see both of its nets [closed form: 1 nA at 1 V]. */
	static final double OPEN_FUSE_OHMS = 1e9;
	/**
	 * A tripped resettable fuse, as a resistance [unconfirmed: a tripped polymer fuse holds itself hot at about a
	 * watt, which at a mains peak is of the order of 100 kΩ].
	 */
	static final double TRIPPED_RESETTABLE_OHMS = 1e5;

	private CaseRunner() {
	}

	/** Every case's outcomes, in the check's order, all kept: for one design solved for inspection. */
	public static List<CaseOutcome> run(CompiledDesign design, ReviewPolicy policy) {
		java.util.SortedMap<Long, CaseOutcome> outcomes = new java.util.TreeMap<>();
		each(design, policy, (order, outcome) -> {
			synchronized (outcomes) {
				outcomes.put(order, outcome);
			}
		});
		return new ArrayList<>(outcomes.values());
	}

	/**
	 * Where each outcome goes as soon as it is solved. The mains and surge cases are solved in parallel, so
	 * outcomes come from several threads at once and in no set order; {@code order} is an outcome's place in
	 * the check's order (see {@link CaseRunner#order}). Nothing is kept once the sink returns: a mains case's
	 * whole cycle (36 solutions) is garbage unless the sink keeps it, and a design with many terminals has
	 * thousands of mains cases.
	 */
	public interface Sink {
		void take(long order, CaseOutcome outcome);
	}

	/** The place of a case's k-th outcome in the check's order: the cases in turn, each case's outcomes in turn. */
	public static long order(int caseIndex, int outcome) {
		return ((long) caseIndex << 32) | outcome;
	}

	/** Solves every case, giving each outcome to {@code sink} as soon as it is solved. */
	public static void each(CompiledDesign design, ReviewPolicy policy, Sink sink) {
		DcSolver solver = new DcSolver();
		Map<String, PreparedCircuit> prepared = new HashMap<>();
		List<FaultCase> cases = CaseGenerator.cases(design, policy);
		PreparedCircuit[] circuits = new PreparedCircuit[cases.size()];
		List<Integer> waveforms = new ArrayList<>();
		DcSolution before = null;
		// the DC cases in order (each may start from the state of the design at rest, the first one's); the
		// mains and surge cases after them, in parallel: they share nothing but the prepared circuits
		for (int i = 0; i < cases.size(); i++) {
			FaultCase c = cases.get(i);
			Budget.checkpoint("case '" + c.name() + "'");
			PreparedCircuit circuit = prepared.computeIfAbsent(shape(c), k -> DcSolver.prepare(apply(design.circuit(), c)));
			for (Device d : c.added()) {
				circuit = circuit.with(d.name(), d);
			}
			for (Map.Entry<String, Device> r : c.replaced().entrySet()) {
				circuit = circuit.with(r.getKey(), r.getValue());
			}
			if (c.isSurge() || c.isMains()) {
				circuits[i] = circuit;
				waveforms.add(i);
				continue;
			}
			BalancePoints.Settled settled = BalancePoints.settle(solver, circuit, solver.solve(circuit), before);
			FaultCase named = settled.note() == null ? c
					: new FaultCase(c.name() + " (" + settled.note() + ")", c.kind(), c.added(), c.replaced(), c.from(), c.to());
			if (before == null && settled.result() instanceof DcSolution s) {
				before = s; // the first case, the design as it rests: the state the others start from
			}
			List<CaseOutcome> outcomes = openFuses(design, solver, named, circuit, settled.result());
			for (int k = 0; k < outcomes.size(); k++) {
				sink.take(order(i, k), outcomes.get(k));
			}
		}
		prepared.clear();
		Budget budget = Budget.current();
		waveforms.parallelStream().forEach(i -> Budget.within(budget, () -> {
			FaultCase c = cases.get(i);
			Budget.checkpoint("case '" + c.name() + "'");
			PreparedCircuit circuit = circuits[i];
			circuits[i] = null; // its factorisation is garbage once solved: thousands of cases must not keep theirs
			List<CaseOutcome> outcomes = c.isSurge() ? SurgeRunner.run(design, c, circuit, solver)
					: MainsRunner.run(design, c, circuit, solver);
			for (int k = 0; k < outcomes.size(); k++) {
				sink.take(order(i, k), outcomes.get(k));
			}
		}));
	}

	/** What decides the matrix pattern: the added devices' kinds, names and nets, and what is replaced. */
	private static String shape(FaultCase c) {
		StringBuilder s = new StringBuilder();
		for (Device d : c.added()) {
			s.append(d.getClass().getSimpleName()).append(' ').append(d.name()).append(' ')
					.append(java.util.Arrays.toString(d.pins())).append(';');
		}
		s.append('|').append(c.replaced().keySet());
		return s.toString();
	}

	private static Circuit apply(Circuit base, FaultCase c) {
		Circuit circuit = base.plus(c.added());
		for (Map.Entry<String, Device> r : c.replaced().entrySet()) {
			circuit = circuit.withDevice(circuit.deviceIndex(r.getKey()), r.getValue());
		}
		return circuit;
	}

	/**
	 * Opens every fuse over its rating, one round at a time, until none is; names them in the case. Before the
	 * first round opens, the circuit stays whole until the slowest of those fuses has taken in its pre-arcing
	 * I²t, t = I²t / I² [closed form, constant current]: that moment is an outcome of its own, its
	 * instantaneous stresses judged, and each part's energy over it, P·t, a pulse.
	 */
	private static List<CaseOutcome> openFuses(CompiledDesign design, DcSolver solver, FaultCase c,
			PreparedCircuit circuit, DcResult result) {
		List<CaseOutcome> outcomes = new ArrayList<>();
		Map<String, Device> opened = new LinkedHashMap<>();
		while (result instanceof DcSolution s) {
			List<Fuse> opening = new ArrayList<>();
			for (Device d : circuit.circuit().devices()) {
				if (d instanceof Fuse f && !opened.containsKey(f.name())
						&& Math.abs(s.device(f.name()).current()) > f.ratedAmps()) {
					opening.add(f);
				}
			}
			if (opening.isEmpty()) {
				break;
			}
			if (opened.isEmpty()) {
				outcomes.add(beforeOpening(design, c, s, opening));
			}
			for (Fuse f : opening) {
				Fuse open = opened(f);
				opened.put(f.name(), open);
				circuit = circuit.with(f.name(), open);
			}
			result = solver.solve(circuit);
		}
		outcomes.add(new CaseOutcome(opened.isEmpty() ? c : withOpened(c, opened), result));
		return outcomes;
	}

	private static CaseOutcome beforeOpening(CompiledDesign design, FaultCase c, DcSolution whole, List<Fuse> opening) {
		double seconds = 0, largestI2t = 0;
		for (Fuse f : opening) {
			double i2t = FuseRatings.preArcingI2t(design.parts().get(f.name()), f.ratedAmps());
			double amps = whole.device(f.name()).current();
			seconds = Math.max(seconds, i2t / (amps * amps));
			largestI2t = Math.max(largestI2t, i2t);
		}
		Map<String, Double> energy = new LinkedHashMap<>();
		for (String part : design.parts().keySet()) {
			energy.put(part, Math.abs(whole.device(part).power()) * seconds);
		}
		FaultCase moment = c.momentarily(c.name() + ", " + FuseRatings.beforeClearing(opening, largestI2t, seconds));
		return new CaseOutcome(moment, whole, energy);
	}

	/** A fuse that has opened: a tripped resettable one holds itself hot, any other is a gap. */
	static Fuse opened(Fuse f) {
		return new Fuse(f.name(), f.pins()[0], f.pins()[1], f.resettable() ? TRIPPED_RESETTABLE_OHMS : OPEN_FUSE_OHMS,
				f.ratedAmps(), f.resettable());
	}

	/** The case with these fuses opened, named for them ("…, F1 open"; "…, F2 tripped" for resettable ones). */
	static FaultCase withOpened(FaultCase c, Map<String, Device> opened) {
		Map<String, Device> replaced = new LinkedHashMap<>(c.replaced());
		replaced.putAll(opened);
		boolean tripped = opened.values().stream().allMatch(d -> d instanceof Fuse f && f.resettable());
		return new FaultCase(c.name() + ", " + String.join(", ", opened.keySet()) + (tripped ? " tripped" : " open"),
				c.kind(), c.added(), replaced, c.from(), c.to());
	}
}
