package bulwark.check.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import bulwark.check.finding.Concern;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Locations;
import bulwark.check.finding.Severity;
import bulwark.check.stress.Limit;
import bulwark.check.stress.Limits;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.check.topology.SeriesStrings.SeriesString;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;
import bulwark.check.figures.Figures;
import bulwark.check.cases.SolvedCase;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;

/**
 * A series string of resistors (see SeriesStrings) whose voltage, shared in proportion to the values, puts
 * some member over its own derated limiting element voltage. The string is judged member by member — a
 * string of equal parts whose total rating covers the fault still fails if one member is larger than the
 * others and takes more than its share. The finding names the string, the member, its share and its limit,
 * and says when the sharing is unequal.
 */
public final class SeriesStringRule implements Rule {
	public static final RuleId ID = RuleId.of("series-string");
	/** Shares differing by more than this ratio are called unequal [common practice: 10 % tolerance band]. */
	static final double UNEQUAL = 1.1;
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.SERIES_STRING, Severity.ERROR,
			"a resistor in a series string takes more than its derated limiting element voltage");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	@Override
	public void check(CheckContext context, Consumer<Finding> findings) {
		Measure voltage = StressCatalog.VOLTAGE;
		for (SeriesString string : context.seriesStrings()) {
			List<Optional<Limit>> limits = new ArrayList<>();
			for (Part r : string.resistors()) {
				limits.add(Limits.of(r, voltage, context.policy()));
			}
			double worstUse = 0;
			int worstMember = -1;
			SolvedCase worstCase = null;
			for (SolvedCase c : context.cases()) {
				for (int i = 0; i < string.resistors().size(); i++) {
					if (limits.get(i).isEmpty()) {
						continue;
					}
					double use = voltage.of(c.solution().device(string.resistors().get(i).getName()))
							/ limits.get(i).get().value();
					if (use > worstUse) {
						worstUse = use;
						worstMember = i;
						worstCase = c;
					}
				}
			}
			if (worstUse > 1) {
				findings.accept(finding(string, worstMember, worstCase, limits.get(worstMember).get(), voltage));
			}
		}
	}

	private Finding finding(SeriesString string, int member, SolvedCase c, Limit limit, Measure voltage) {
		double total = 0, largest = 0, smallest = Double.POSITIVE_INFINITY;
		double[] shares = new double[string.resistors().size()];
		for (int i = 0; i < shares.length; i++) {
			shares[i] = voltage.of(c.solution().device(string.resistors().get(i).getName()));
			total += shares[i];
			largest = Math.max(largest, shares[i]);
			smallest = Math.min(smallest, shares[i]);
		}
		Part part = string.resistors().get(member);
		StringBuilder sharing = new StringBuilder();
		if (largest > UNEQUAL * smallest) {
			sharing.append("; the sharing is unequal (");
			for (int i = 0; i < shares.length; i++) {
				sharing.append(i == 0 ? "" : ", ").append(string.resistors().get(i).getName()).append(' ')
						.append(String.format(Locale.ROOT, "%.0f %%", 100 * shares[i] / total));
			}
			sharing.append(')');
		}
		String message = String.format(Locale.ROOT,
				"series string %s carries %s in case '%s'; %s takes %s (%.0f %% of it), over %s, %.0f %% of the limit%s",
				string.label(), Figures.engineering(total, "V"), c.faultCase().name(), part.getName(),
				Figures.engineering(shares[member], "V"), 100 * shares[member] / total, limit.describe(),
				100 * shares[member] / limit.value(), sharing);
		return Finding.of(INFO, message)
				.about(part.getName(), c.faultCase().name(), Locations.of(part, DesignPackage.Literals.MEMBER__NAME))
				.judged(shares[member], limit.value(), "V");
	}
}
