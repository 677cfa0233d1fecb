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

	/** A string's most used member so far: how much of its limit, in which case, and every member's share then. */
	private static final class Use {
		final List<Optional<Limit>> limits = new ArrayList<>();
		double worst;
		int member = -1;
		String caseName;
		double[] shares;
		long order;
	}

	@Override
	public RuleReading start(CheckContext context) {
		Measure voltage = StressCatalog.VOLTAGE;
		java.util.Map<SeriesString, Use> uses = new java.util.LinkedHashMap<>();
		for (SeriesString string : context.seriesStrings()) {
			Use u = new Use();
			for (Part r : string.resistors()) {
				u.limits.add(Limits.of(r, voltage, context.policy()));
			}
			uses.put(string, u);
		}
		return new RuleReading() {
			@Override
			public void read(long order, SolvedCase c) {
				uses.forEach((string, u) -> {
					double[] shares = null;
					for (int i = 0; i < string.resistors().size(); i++) {
						if (u.limits.get(i).isEmpty()) {
							continue;
						}
						double use = voltage.of(c.solution().device(string.resistors().get(i).getName()))
								/ u.limits.get(i).get().value();
						if (use > u.worst || use == u.worst && u.member >= 0 && order < u.order) {
							if (shares == null) {
								shares = new double[string.resistors().size()];
								for (int k = 0; k < shares.length; k++) {
									shares[k] = voltage.of(c.solution().device(string.resistors().get(k).getName()));
								}
							}
							u.worst = use;
							u.member = i;
							u.caseName = c.faultCase().name();
							u.shares = shares;
							u.order = order;
						}
					}
				});
			}

			@Override
			public void findings(Consumer<Finding> findings) {
				uses.forEach((string, u) -> {
					if (u.worst > 1) {
						findings.accept(finding(string, u));
					}
				});
			}
		};
	}

	private Finding finding(SeriesString string, Use u) {
		int member = u.member;
		double[] shares = u.shares;
		Limit limit = u.limits.get(member).get();
		double total = 0, largest = 0, smallest = Double.POSITIVE_INFINITY;
		for (double share : shares) {
			total += share;
			largest = Math.max(largest, share);
			smallest = Math.min(smallest, share);
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
				"series string %s carries %s in case '%s'; %s takes %s (%.0f %% of it), over %s, %s%s",
				string.label(), Figures.engineering(total, "V"), u.caseName, part.getName(),
				Figures.engineering(shares[member], "V"), 100 * shares[member] / total, limit.describe(),
				Figures.ofTheLimit(shares[member], limit.value()), sharing);
		return Finding.of(INFO, message)
				.about(part.getName(), u.caseName, Locations.of(part, DesignPackage.Literals.MEMBER__NAME))
				.judged(shares[member], limit.value(), "V");
	}
}
