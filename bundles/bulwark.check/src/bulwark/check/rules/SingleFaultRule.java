package bulwark.check.rules;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;

import bulwark.check.faults.Fault;
import bulwark.check.faults.FaultConsequence;
import bulwark.check.faults.SingleFaultAnalysis;
import bulwark.check.figures.Figures;
import bulwark.check.finding.Concern;
import bulwark.check.finding.Finding;
import bulwark.check.finding.FindingDetail;
import bulwark.check.finding.Locations;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;
import bulwark.check.finding.Severity;
import bulwark.check.stress.Overstress;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;

/**
 * The protection relies on one part alone: with that part failed (shorted, opened, shorted between two of
 * its pins), some case of the policy puts another part over its absolute rating, or cannot be solved at all.
 * One finding per fault that has a consequence, on the failed part, naming the worst consequence and how
 * many more there are. Run only when asked for — a policy that gives this rule a severity
 * ({@code severity "single-fault" warning}) or {@code bulwark check --single-faults} — since it solves every
 * case again for every fault.
 */
public final class SingleFaultRule implements FigureRule {
	public static final RuleId ID = RuleId.of("single-fault");
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.SINGLE_FAULT, Severity.WARNING,
			"with one part failed, another part exceeds its absolute rating in some case (or the case cannot be solved)");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	/** Whether a policy asks for the analysis: it names a severity for this rule. */
	public static boolean askedFor(bulwark.check.policy.ReviewPolicy policy) {
		return policy.severities().containsKey(ID);
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		if (!askedFor(context.policy())) {
			return;
		}
		SingleFaultAnalysis.Result result = SingleFaultAnalysis.run(context.design(), context.policy());
		// what the designer kept out is listed, so that a reviewer reads the claim beside the analysis
		result.exempted().forEach((name, reason) -> findings.accept(Finding.of(INFO, String.format(Locale.ROOT,
				"%s is not failed in the single-fault analysis: integrity high, because \"%s\"", name, reason))
				.withSeverity(bulwark.check.finding.Severity.INFO)
				.about(name, null, Locations.of(context.design().parts().get(name), DesignPackage.Literals.MEMBER__NAME))));
		for (Map.Entry<Fault, List<FaultConsequence>> e : result.byFault().entrySet()) {
			List<FaultConsequence> consequences = e.getValue();
			if (consequences.isEmpty()) {
				continue;
			}
			Fault fault = e.getKey();
			Part failed = context.design().parts().get(fault.part());
			FaultConsequence worst = consequences.get(0);
			Finding f = Finding.of(INFO, message(fault, worst, consequences.size() - 1))
					.about(fault.part(), worst.caseName(), Locations.of(failed, DesignPackage.Literals.MEMBER__NAME))
					.with(detail(fault, consequences));
			Overstress o = worst.overstress();
			findings.accept(o == null ? f : f.judged(o.measure().rating(), o.value(), o.limit().value(), o.measure().unit()));
		}
	}

	private static FindingDetail.SingleFault detail(Fault fault, List<FaultConsequence> consequences) {
		List<FindingDetail.Consequence> list = consequences.stream().map(c -> {
			Overstress o = c.overstress();
			return o == null ? new FindingDetail.Consequence(c.caseName(), null, null, null, null, null, c.unsolved())
					: new FindingDetail.Consequence(c.caseName(), o.part().getName(), o.measure().rating(), o.value(),
							o.limit().value(), o.measure().unit(), null);
		}).toList();
		return new FindingDetail.SingleFault(fault.part(), fault.mode().words(), list);
	}

	/**
	 * "with R1 short, case 'x' puts 1 W into R2 (rated 500 mW, 200 % of it): R2 relies on R1 alone; and 2 more
	 * parts over their ratings".
	 */
	static String message(Fault fault, FaultConsequence worst, int more) {
		String rest = more == 0 ? "" : String.format(Locale.ROOT, "; and %d more consequence%s", more, more == 1 ? "" : "s");
		Overstress o = worst.overstress();
		if (o == null) {
			return String.format(Locale.ROOT, "with %s, case '%s' cannot be solved: %s%s", fault.describe(), worst.caseName(),
					worst.unsolved(), rest);
		}
		String part = o.part().getName();
		return String.format(Locale.ROOT, "with %s, case '%s' puts %s %s on %s (rated %s, %s %% of it): the protection of"
				+ " %s relies on %s alone%s", fault.describe(), worst.caseName(), o.measure().what(),
				Figures.over(o.value(), o.limit().value(), o.measure().unit()), part,
				Figures.engineering(o.limit().rated(), o.measure().unit()), Figures.percentOf(o.value(), o.limit().value()),
				part, fault.part(), rest);
	}
}
