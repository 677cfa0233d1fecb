package bulwark.check.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import bulwark.check.DesignResult;
import bulwark.check.WorstStress;
import bulwark.check.figures.Figures;
import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.RulePages;
import bulwark.lang.install.Installation;

/**
 * What a reviewer reads on hovering over a part, in the workbench and in any editor behind the language
 * server: its worst stress against each rating with the case it happens in, then its findings, each with what
 * its rule finds. One content, rendered as plain text or as Markdown, so the two hovers never drift apart.
 */
public record PartSummary(String part, List<String> stresses, List<FindingLine> findings) {
	/** One finding of the part, with its rule's "What" paragraph when the rule has a page. */
	public record FindingLine(String severity, boolean waived, RuleId rule, String message, Optional<String> what) {
	}

	public PartSummary {
		stresses = List.copyOf(stresses);
		findings = List.copyOf(findings);
	}

	/** The summary of a part of the last check; empty when the name is no part the check judged. */
	public static Optional<PartSummary> of(DesignResult result, String part, Installation installation) {
		List<String> stresses = new ArrayList<>();
		for (WorstStress s : result.stresses()) {
			if (s.part().equals(part)) {
				stresses.add(String.format(Locale.ROOT, "%s: %s in case '%s'%s", s.what(),
						Figures.engineering(s.value(), s.unit()), s.caseName(),
						s.utilisation() == null ? " (no rating)"
								: String.format(Locale.ROOT, ", %.0f %% of %s", 100 * s.utilisation(),
										Figures.engineering(s.limit(), s.unit()))));
			}
		}
		if (stresses.isEmpty()) {
			return Optional.empty();
		}
		List<FindingLine> findings = new ArrayList<>();
		for (Finding f : result.findings()) {
			if (part.equals(f.part())) {
				findings.add(new FindingLine(f.severity().id(), f.waived(), f.rule(), f.message(),
						RulePages.what(installation, f.rule()).map(w -> w.replace('\n', ' '))));
			}
		}
		return Optional.of(new PartSummary(part, stresses, findings));
	}

	/** Plain text, for an editor's tooltip. */
	public String text() {
		StringBuilder text = new StringBuilder(part).append(", worst stress per rating");
		stresses.forEach(s -> text.append("\n  ").append(s));
		for (FindingLine f : findings) {
			text.append('\n').append(f.severity()).append(f.waived() ? " (waived) " : " ").append(f.rule()).append(": ")
					.append(f.message());
			f.what().ifPresent(w -> text.append("\n    (").append(f.rule()).append(": ").append(w).append(')'));
		}
		return text.toString();
	}

	/** Markdown, for a language server's hover. */
	public String markdown() {
		StringBuilder md = new StringBuilder("**").append(part).append("**, worst stress per rating\n\n");
		stresses.forEach(s -> md.append("- ").append(s).append('\n'));
		if (!findings.isEmpty()) {
			md.append('\n');
		}
		for (int i = 0; i < findings.size(); i++) {
			FindingLine f = findings.get(i);
			md.append(i == 0 ? "" : "\n").append("- **").append(f.severity()).append(f.waived() ? "** (waived) " : "** ")
					.append(f.rule()).append(": ").append(f.message());
			f.what().ifPresent(w -> md.append("\n\n  *").append(f.rule()).append("*: ").append(w));
		}
		return md.toString();
	}
}
