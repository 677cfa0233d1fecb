package bulwark.check.faults;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import bulwark.check.budget.Budget;
import bulwark.check.cases.CaseOutcome;
import bulwark.check.compile.CaseRunner;
import bulwark.check.compile.CompiledDesign;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.stress.Overstress;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.SolveFailure;
import bulwark.lang.design.Part;

/**
 * Every part failed in each of its {@link FailureModes}, one at a time, and every case of the policy solved
 * again with it — mains as waveforms, surges, fuses clearing, as in the check itself: each other part whose
 * stress then exceeds its absolute rating (no derating — it would be a second failure) is a consequence, and
 * so is a case that can no longer be solved. A part already over its absolute rating with no part failed is
 * left to the check's own findings: the fault adds nothing to it. Faults run in parallel.
 */
public final class SingleFaultAnalysis {
	/**
	 * The outcome of every fault tried, in the design's order; the parts no fault was tried on; and the parts
	 * the design keeps out with {@code integrity high}, each with its reason.
	 */
	public record Result(Map<Fault, List<FaultConsequence>> byFault, List<String> notFailed, Map<String, String> exempted) {
		public int faultsTried() {
			return byFault.size();
		}
	}

	private SingleFaultAnalysis() {
	}

	public static Result run(CompiledDesign design, ReviewPolicy policy) {
		ReviewPolicy absolute = policy.notDerated();
		List<Fault> faults = new ArrayList<>();
		List<String> notFailed = new ArrayList<>();
		Map<String, String> exempted = new LinkedHashMap<>();
		for (Part part : design.parts().values()) {
			Optional<String> reason = integrityReason(part);
			if (reason.isPresent()) {
				exempted.put(part.getName(), reason.get());
				continue;
			}
			List<FailureMode> modes = FailureModes.of(part.getKind());
			if (modes.isEmpty()) {
				notFailed.add(part.getName());
			}
			modes.forEach(m -> faults.add(new Fault(part.getName(), m)));
		}
		// what is over its absolute rating with no part failed is the check's own finding, not a fault's
		Set<String> already = new HashSet<>(overstressed(design, absolute, null, design.parts().values()).keySet());
		Budget budget = Budget.current();
		List<List<FaultConsequence>> found = faults.parallelStream().map(f -> {
			List<List<FaultConsequence>> one = new ArrayList<>(1);
			Budget.within(budget, () -> {
				Budget.checkpoint("single fault " + f.describe());
				one.add(consequences(design, absolute, f, already));
			});
			return one.get(0);
		}).toList();
		Map<Fault, List<FaultConsequence>> byFault = new LinkedHashMap<>();
		for (int i = 0; i < faults.size(); i++) {
			byFault.put(faults.get(i), found.get(i));
		}
		return new Result(byFault, notFailed, exempted);
	}

	/** The reason a part is kept out ({@code integrity high because "…"}), its definition's included. */
	static Optional<String> integrityReason(Part part) {
		List<bulwark.lang.design.Setting> settings = new ArrayList<>(part.getSettings());
		if (part.getBase() != null) {
			settings.addAll(part.getBase().getSettings());
		}
		for (bulwark.lang.design.Setting s : settings) {
			if (s instanceof bulwark.lang.design.Parameter p && "integrity".equals(p.getName()) && "high".equals(p.getWord())) {
				return Optional.of(p.getReason() == null ? "" : p.getReason());
			}
		}
		return Optional.empty();
	}

	/**
	 * The consequences of one fault, worst first: for each other part and rating not already over its rating
	 * without the fault, its worst case; and each case the fault leaves unsolvable.
	 */
	static List<FaultConsequence> consequences(CompiledDesign design, ReviewPolicy absolute, Fault fault,
			Set<String> already) {
		CompiledDesign failed = FaultInjector.apply(design, fault);
		Map<String, FaultConsequence> worst = overstressed(failed, absolute, fault, failed.parts().values());
		List<FaultConsequence> list = new ArrayList<>(worst.entrySet().stream().filter(e -> !already.contains(e.getKey()))
				.map(Map.Entry::getValue).toList());
		list.sort(Comparator.comparingDouble(FaultConsequence::severity).reversed());
		return list;
	}

	/** Every case of the design solved; for each part and rating over its limit, the worst ("R2 power" → it). */
	private static Map<String, FaultConsequence> overstressed(CompiledDesign design, ReviewPolicy absolute, Fault fault,
			Collection<Part> parts) {
		Map<String, FaultConsequence> worst = new LinkedHashMap<>();
		for (CaseOutcome outcome : CaseRunner.run(design, absolute)) {
			String name = outcome.faultCase().name();
			if (!(outcome.result() instanceof DcSolution s)) {
				worst.putIfAbsent("unsolved " + name,
						FaultConsequence.unsolvable(fault, name, ((SolveFailure) outcome.result()).message()));
				continue;
			}
			for (Overstress o : Overstress.in(parts, outcome.faultCase(), s, outcome.averagePower(), absolute)) {
				String key = o.part().getName() + " " + o.measure().rating();
				FaultConsequence c = FaultConsequence.over(fault, name, o);
				FaultConsequence before = worst.get(key);
				if (before == null || c.severity() > before.severity()) {
					worst.put(key, c);
				}
			}
		}
		return worst;
	}
}
