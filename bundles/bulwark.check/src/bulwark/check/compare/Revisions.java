package bulwark.check.compare;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import bulwark.check.cases.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.cases.PartStress;
import bulwark.check.finding.Severity;

/**
 * What changed between two revisions of a design, for review: findings that are new or fixed (a finding's
 * identity is its rule and part — lines move and messages carry figures), and parts whose worst utilisation
 * moved by at least {@link #NOTICEABLE}, worse or better.
 */
public final class Revisions {
	/** A change of utilisation worth listing: half a percentage point of the derated rating [common practice]. */
	public static final double NOTICEABLE = 0.005;

	/** One change: new, fixed, worse or better, and what. */
	public record Change(String kind, String text, boolean newError) {
	}

	private Revisions() {
	}

	public static List<Change> compare(DesignResult before, DesignResult after) {
		List<Change> changes = new ArrayList<>();
		Set<String> was = keys(before), is = keys(after);
		for (Finding f : after.findings()) {
			if (!was.contains(key(f))) {
				changes.add(new Change("new", f.severity().id() + " " + f.rule() + " " + f.message(),
						f.severity() == Severity.ERROR && !f.waived()));
			}
		}
		for (Finding f : before.findings()) {
			if (!is.contains(key(f))) {
				changes.add(new Change("fixed", f.severity().id() + " " + f.rule() + " " + f.message(), false));
			}
		}
		Map<String, Double> u0 = worst(before), u1 = worst(after);
		for (Map.Entry<String, Double> e : u1.entrySet()) {
			Double old = u0.get(e.getKey());
			if (old != null && Math.abs(e.getValue() - old) >= NOTICEABLE) {
				changes.add(new Change(e.getValue() > old ? "worse" : "better", String.format(Locale.ROOT,
						"%s worst utilisation %.0f %% → %.0f %%", e.getKey(), 100 * old, 100 * e.getValue()), false));
			}
		}
		return changes;
	}

	private static String key(Finding f) {
		return f.rule() + "\u0000" + (f.part() == null ? f.message() : f.part());
	}

	private static Set<String> keys(DesignResult r) {
		Set<String> keys = new LinkedHashSet<>();
		r.findings().forEach(f -> keys.add(key(f)));
		return keys;
	}

	private static Map<String, Double> worst(DesignResult r) {
		Map<String, Double> worst = new LinkedHashMap<>();
		for (CaseResult c : r.cases()) {
			for (PartStress p : c.parts()) {
				if (p.utilisation() != null) {
					worst.merge(p.part(), p.utilisation(), Math::max);
				}
			}
		}
		return worst;
	}
}
