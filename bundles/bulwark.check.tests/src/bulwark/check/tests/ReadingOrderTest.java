package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.xtext.util.CancelIndicator;
import org.junit.jupiter.api.Test;

import bulwark.check.Preparation;
import bulwark.check.cases.CaseOutcome;
import bulwark.check.cases.SolvedCase;
import bulwark.check.compile.CaseRunner;
import bulwark.check.compile.CompiledDesign;
import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleId;
import bulwark.check.function.FunctionFigures;
import bulwark.check.policy.DefaultPolicy;
import bulwark.check.policy.ReviewPolicy;
import bulwark.check.rules.CheckContext;
import bulwark.check.rules.InputRangeRule;
import bulwark.check.rules.ReversePathRule;
import bulwark.check.rules.Rule;
import bulwark.check.rules.RuleReading;
import bulwark.check.rules.RuleRegistry;
import bulwark.check.rules.SeriesStringRule;
import bulwark.check.rules.SurgeEnergyRule;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.check.stress.WorstFigures;
import bulwark.engine.solve.DcSolution;
import bulwark.lang.design.Part;

/**
 * The mains and surge cases are solved in parallel, so the rules read them in no set order: whatever the
 * order, every rule must give the same findings and every part the same worst figures, ties going to the
 * case earlier in the check's order. Each design is read forwards and backwards, and the findings of the
 * rules that read cases themselves must be among what it gives, so the comparison has something to compare.
 */
class ReadingOrderTest {
	private static final List<String> DESIGNS = List.of(ReversePathRuleTest.EXPOSED, SeriesStringRuleTest.STRING,
			InputRangeRuleTest.HIGH, SurgeEnergyRuleTest.ACROSS, MainsWaveformTest.DROPPER);

	private record Read(List<String> findings, List<String> worst) {
	}

	@Test
	void theOrderCasesAreReadInChangesNothing() {
		Set<RuleId> seen = new HashSet<>();
		int cases = 0;
		for (String text : DESIGNS) {
			Preparation p = Fixtures.defaultChecker().prepare(text, "fixture.bulwark", CancelIndicator.NullImpl);
			assertTrue(p instanceof Preparation.Ready, () -> "not prepared: " + p);
			CompiledDesign compiled = ((Preparation.Ready) p).design().compiled();
			ReviewPolicy policy = DefaultPolicy.POLICY;
			List<CaseOutcome> outcomes = CaseRunner.run(compiled, policy);
			List<Integer> order = new ArrayList<>();
			for (int i = 0; i < outcomes.size(); i++) {
				order.add(i);
			}
			Read forwards = read(compiled, policy, outcomes, order, seen);
			Collections.reverse(order);
			Read backwards = read(compiled, policy, outcomes, order, seen);
			assertEquals(forwards, backwards);
			cases += outcomes.size();
		}
		assertTrue(cases > 20, "too few cases to reorder: " + cases);
		assertTrue(seen.containsAll(Set.of(ReversePathRule.ID, SeriesStringRule.ID, InputRangeRule.ID, SurgeEnergyRule.ID)),
				() -> "the designs do not trigger every rule that reads cases: " + seen);
	}

	/** Every rule's findings and every part's worst figures, the outcomes read in the given order. */
	private static Read read(CompiledDesign compiled, ReviewPolicy policy, List<CaseOutcome> outcomes,
			List<Integer> order, Set<RuleId> seen) {
		WorstFigures worst = new WorstFigures(List.copyOf(compiled.parts().values()));
		CheckContext context = CheckContext.of(compiled, policy, FunctionFigures.NONE, worst);
		List<RuleReading> readings = new ArrayList<>();
		for (Rule r : RuleRegistry.all()) {
			readings.add(r.start(context));
		}
		for (int i : order) {
			CaseOutcome o = outcomes.get(i);
			if (o.result() instanceof DcSolution s) {
				SolvedCase c = new SolvedCase(o.faultCase(), s, o.pulseEnergy(), o.averagePower());
				worst.read(i, c, policy);
				readings.forEach(r -> r.read(i, c));
			}
		}
		List<String> findings = new ArrayList<>();
		for (RuleReading r : readings) {
			r.findings((Finding f) -> {
				seen.add(f.rule());
				findings.add(f.rule() + " " + f.message());
			});
		}
		List<String> figures = new ArrayList<>();
		for (Part part : compiled.parts().values()) {
			for (Measure m : StressCatalog.of(part.getKind())) {
				worst.of(part.getName(), m).ifPresent(w -> figures.add(part.getName() + " " + m.rating() + " " + w));
			}
			worst.pulse(part.getName()).ifPresent(w -> figures.add(part.getName() + " pulse " + w));
		}
		return new Read(findings, figures);
	}
}
