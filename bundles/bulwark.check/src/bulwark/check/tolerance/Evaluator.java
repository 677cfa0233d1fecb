package bulwark.check.tolerance;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import bulwark.check.cases.CaseOutcome;
import bulwark.check.compile.CaseRunner;
import bulwark.check.compile.CompiledDesign;
import bulwark.check.compile.DesignCompiler;
import bulwark.check.parts.Values;
import bulwark.check.function.FunctionAnalysis;
import bulwark.check.function.FunctionFigures;
import bulwark.check.function.PairFigures;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.stress.Limit;
import bulwark.check.stress.Limits;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.SolveFailure;
import bulwark.lang.design.Design;
import bulwark.lang.design.Part;

/**
 * Solves the design at one set of parameter values — every case of the review policy, then the function
 * figures — and gives the figures a tolerance analysis follows: per measuring pair the threshold, test
 * current and open-circuit voltage; the standby current and battery life; and each part's worst
 * utilisation of its derated ratings over every case. Stateless; safe to call from several threads.
 */
public final class Evaluator {
	private final Design design;
	private final ReviewPolicy policy;

	public Evaluator(Design design, ReviewPolicy policy) {
		this.design = design;
		this.policy = policy;
	}

	public Evaluation evaluate(Values values) {
		CompiledDesign compiled = DesignCompiler.compile(design, values);
		List<CaseOutcome> outcomes = CaseRunner.run(compiled, policy);
		Map<Figure, Double> figures = new LinkedHashMap<>();
		for (CaseOutcome o : outcomes) {
			if (!(o.result() instanceof DcSolution)) {
				return new Evaluation(Map.of(), "case '" + o.faultCase().name() + "': "
						+ ((SolveFailure) o.result()).message());
			}
		}
		DcSolution open = (DcSolution) outcomes.get(0).result();
		FunctionFigures f = FunctionAnalysis.of(compiled, open, false); // the switching voltages are not followed
		for (PairFigures p : f.pairs()) {
			String pair = p.from() + "–" + p.to();
			if (p.thresholdOhms() != null) {
				figures.put(new Figure("threshold " + pair, "Ω", true), p.thresholdOhms());
			}
			figures.put(new Figure("test current " + pair, "A", true), p.testCurrentAmps());
			figures.put(new Figure("open voltage " + pair, "V", false), Math.abs(p.openVolts()));
		}
		if (f.standbyAmps() != null) {
			figures.put(new Figure("standby current", "A", true), f.standbyAmps());
		}
		if (f.batteryLifeHours() != null && Double.isFinite(f.batteryLifeHours())) {
			figures.put(new Figure("battery life", "h", false), f.batteryLifeHours());
		}
		for (Part part : compiled.parts().values()) {
			double worst = Double.NEGATIVE_INFINITY;
			for (Measure m : StressCatalog.of(part.getKind())) {
				Optional<Limit> limit = Limits.of(part, m, policy);
				if (limit.isEmpty()) {
					continue;
				}
				for (CaseOutcome o : outcomes) {
					double v = m.judged(o.faultCase(), ((DcSolution) o.result()).device(part.getName()), o.averagePower(),
							part.getName());
					if (!Double.isNaN(v)) {
						worst = Math.max(worst, v / limit.get().value());
					}
				}
			}
			if (worst > Double.NEGATIVE_INFINITY) {
				figures.put(new Figure("utilisation " + part.getName(), "", true), worst);
			}
		}
		return new Evaluation(figures, null);
	}
}
