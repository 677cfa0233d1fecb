package bulwark.check;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.SortedMap;
import java.util.TreeMap;

import bulwark.check.cases.CaseKind;
import bulwark.check.cases.CaseOutcome;
import bulwark.check.cases.CaseResult;
import bulwark.check.cases.FaultCase;
import bulwark.check.cases.PartStress;
import bulwark.check.cases.SolvedCase;
import bulwark.check.compile.CaseRunner;
import bulwark.check.compile.CompiledDesign;
import bulwark.check.finding.Finding;
import bulwark.check.function.FunctionAnalysis;
import bulwark.check.function.FunctionFigures;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.rules.CheckContext;
import bulwark.check.rules.Rule;
import bulwark.check.rules.RuleReading;
import bulwark.check.stress.WorstFigures;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.SolveFailure;

/**
 * What the check takes from each case as it is solved — its figures for the reports, each part's worst
 * stresses, what the rules read, a waveform case's trace — so that no solution is kept: a design with a
 * hundred terminals has tens of thousands of cases. One case at a time, though they come from several
 * threads: reading a part's ratings caches them on the model, which is not thread-safe.
 */
final class CaseReading implements CaseRunner.Sink {
	/**
	 * The waveform cases plotted: every one in a design with a few terminals; with many, the
	 * {@value #MOST_TRACES} that stress their most stressed part most, for a page of thousands of plots is read
	 * by no one.
	 */
	static final int MOST_TRACES = 24;

	private record Plotted(long order, double utilisation, WaveformTrace trace) {
	}

	private final CompiledDesign compiled;
	private final ReviewPolicy policy;
	private final List<Rule> rules;
	private final WorstFigures worst;
	private final SortedMap<Long, CaseResult> results = new TreeMap<>();
	private final List<Plotted> traces = new ArrayList<>();
	private final SortedMap<Long, Finding> failures = new TreeMap<>();
	private CheckContext context;
	private List<RuleReading> readings;

	CaseReading(CompiledDesign compiled, ReviewPolicy policy, List<Rule> rules) {
		this.compiled = compiled;
		this.policy = policy;
		this.rules = List.copyOf(rules);
		this.worst = new WorstFigures(List.copyOf(compiled.parts().values()));
	}

	@Override
	public synchronized void take(long order, CaseOutcome outcome) {
		FaultCase c = outcome.faultCase();
		if (!(outcome.result() instanceof DcSolution solution)) {
			results.put(order, new CaseResult(c.name(), c.kind().id(), false, List.of()));
			failures.put(order, SolverFindings.of(compiled, c, (SolveFailure) outcome.result()));
			return;
		}
		SolvedCase solved = new SolvedCase(c, solution, outcome.pulseEnergy(), outcome.averagePower());
		if (context == null) {
			start(solved);
		}
		List<PartStress> stresses = worst.read(order, solved, policy);
		results.put(order, new CaseResult(c.name(), c.kind().id(), true, stresses));
		if (outcome.cycle() != null) {
			// the part this waveform case stresses most, for plots
			stresses.stream().filter(p -> p.utilisation() != null).max(Comparator.comparingDouble(PartStress::utilisation))
					.ifPresent(p -> plot(order, p.utilisation(), WaveformTrace.of(c.name(), p.part(), outcome.cycle())));
		}
		for (RuleReading r : readings) {
			r.read(order, solved);
		}
	}

	/** Keeps the trace if it is among the most stressing so far; the least stressing (the later on a tie) goes. */
	private void plot(long order, double utilisation, WaveformTrace trace) {
		traces.add(new Plotted(order, utilisation, trace));
		if (traces.size() > MOST_TRACES) {
			traces.remove(traces.stream().min(Comparator.comparingDouble(Plotted::utilisation)
					.thenComparing(Plotted::order, Comparator.reverseOrder())).orElseThrow());
		}
	}

	/**
	 * On the first case that solved (the design at rest, when it solves): the function figures, which are
	 * worked out from it, then the context every rule reads and each rule's reading.
	 */
	private void start(SolvedCase first) {
		FunctionFigures function = first == null || first.faultCase().kind() != CaseKind.NORMAL ? FunctionFigures.NONE
				: FunctionAnalysis.of(compiled, first.solution());
		context = CheckContext.of(compiled, policy, function, worst);
		readings = new ArrayList<>();
		for (Rule r : rules) {
			readings.add(r.start(context));
		}
	}

	/** The context, once every case has been taken (a design none of whose cases solved has no function figures). */
	synchronized CheckContext context() {
		if (context == null) {
			start(null);
		}
		return context;
	}

	/** Each rule's reading, in the rules' order. */
	synchronized List<RuleReading> readings() {
		context();
		return List.copyOf(readings);
	}

	synchronized List<CaseResult> results() {
		return List.copyOf(results.values());
	}

	/** The traces kept, in the check's order. */
	synchronized List<WaveformTrace> traces() {
		return traces.stream().sorted(Comparator.comparingLong(Plotted::order)).map(Plotted::trace).toList();
	}

	/** A finding for each case that did not solve, in the check's order. */
	synchronized List<Finding> failures() {
		return List.copyOf(failures.values());
	}

	WorstFigures worst() {
		return worst;
	}
}
