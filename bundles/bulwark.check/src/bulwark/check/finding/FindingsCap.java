package bulwark.check.finding;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * At most {@link #MAX} findings per design, then one that says how many more there are and of what
 * severity. A broken file can give a finding per character, and a report of a million lines helps no one
 * and can exhaust the memory of every output (the JSON is built whole). The most severe findings are kept
 * first, and the omitted ones still count: the design's status is decided before the cap, and the closing
 * finding carries the most severe omitted severity, so that no exit code changes.
 */
public final class FindingsCap {
	/** Findings listed per design. */
	public static final int MAX = 100;

	private FindingsCap() {
	}

	public static List<Finding> of(List<Finding> findings) {
		if (findings.size() <= MAX) {
			return findings;
		}
		// unwaived errors first, then warnings, notes and waived ones; in text order within each
		List<Finding> ranked = new ArrayList<>(findings);
		ranked.sort(Comparator.comparingInt(FindingsCap::rank));
		List<Finding> kept = new ArrayList<>(ranked.subList(0, MAX - 1));
		List<Finding> left = ranked.subList(MAX - 1, ranked.size());
		long errors = count(left, Severity.ERROR), warnings = count(left, Severity.WARNING),
				infos = count(left, Severity.INFO), waived = left.stream().filter(Finding::waived).count();
		Severity worst = errors > 0 ? Severity.ERROR : warnings > 0 ? Severity.WARNING : Severity.INFO;
		StringBuilder m = new StringBuilder("and ").append(left.size()).append(" more finding(s) not listed (");
		java.util.StringJoiner kinds = new java.util.StringJoiner(", ");
		if (errors > 0) kinds.add(errors + " error(s)");
		if (warnings > 0) kinds.add(warnings + " warning(s)");
		if (infos > 0) kinds.add(infos + " note(s)");
		if (waived > 0) kinds.add(waived + " waived");
		m.append(kinds).append("), from line ").append(left.get(0).location().line())
				.append(": a report lists the first ").append(MAX - 1).append("; mend those and check again");
		kept.sort(Comparator.comparingInt((Finding f) -> f.location().line()).thenComparingInt(f -> f.location().column()));
		kept.add(Finding.of(CheckerRules.OMITTED, m.toString()).withSeverity(worst).at(left.get(0).location())
				.with(new FindingDetail.Omitted(errors, warnings, infos, waived)));
		return List.copyOf(kept);
	}

	private static int rank(Finding f) {
		return f.waived() ? 3 : f.severity().ordinal();
	}

	private static long count(List<Finding> findings, Severity severity) {
		return findings.stream().filter(f -> !f.waived() && f.severity() == severity).count();
	}
}
