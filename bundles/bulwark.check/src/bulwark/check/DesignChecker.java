package bulwark.check;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.validation.Issue;

import bulwark.check.compile.CaseOutcome;
import bulwark.check.compile.CaseRunner;
import bulwark.check.compile.CompiledDesign;
import bulwark.check.compile.DesignCompiler;
import bulwark.check.compile.FaultCase;
import bulwark.check.load.DesignLoader;
import bulwark.check.load.LoadedDesign;
import bulwark.check.rules.CheckContext;
import bulwark.check.rules.Rule;
import bulwark.check.rules.RuleRegistry;
import bulwark.check.rules.SolvedCase;
import bulwark.engine.dc.DcResult;
import bulwark.engine.dc.DcSolution;
import bulwark.engine.dc.SolveFailure;
import bulwark.lang.design.Design;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Member;

/**
 * The whole check of one design: language issues first; if the text is sound, every case is solved and
 * every rule runs. A design that cannot be checked ends with status error and a finding saying why.
 */
public final class DesignChecker {
	private final DesignLoader loader;

	public DesignChecker(DesignLoader loader) {
		this.loader = loader;
	}

	public DesignResult check(Path file) {
		String text;
		try {
			if (Files.size(file) > 4L * InputLimits.MAX_CHARACTERS) { // refuse before reading it into memory
				return notChecked(file.toString(), "the file has " + Files.size(file) + " bytes; designs are limited to "
						+ InputLimits.MAX_CHARACTERS + " characters", SourceLocation.NONE);
			}
			text = Files.readString(file, StandardCharsets.UTF_8);
		} catch (Exception e) {
			return notChecked(file.toString(),
					"cannot read the file: " + e.getClass().getSimpleName() + ": " + e.getMessage(), SourceLocation.NONE);
		}
		return check(text, file.toString(), CancelIndicator.NullImpl);
	}

	public DesignResult check(String text, String file, CancelIndicator cancel) {
		Optional<Finding> refused = InputLimits.check(text);
		if (refused.isPresent()) {
			return notChecked(file, refused.get().message(), refused.get().location());
		}
		return check(loader.load(text, file, cancel));
	}

	public DesignResult check(LoadedDesign loaded) {
		List<Finding> findings = new ArrayList<>();
		boolean languageErrors = false;
		for (Issue issue : loaded.issues()) {
			Finding f = LanguageFindings.of(issue);
			languageErrors |= f.severity() == Severity.ERROR;
			findings.add(f);
		}
		Design design = loaded.design();
		String title = design == null ? null : design.getTitle();
		if (languageErrors || design == null) {
			return new DesignResult(loaded.file(), title, Status.ERROR, findings, List.of());
		}
		CompiledDesign compiled = DesignCompiler.compile(design);
		List<SolvedCase> solved = new ArrayList<>();
		List<CaseResult> caseResults = new ArrayList<>();
		boolean solverFailed = false;
		for (CaseOutcome outcome : CaseRunner.run(compiled)) {
			FaultCase c = outcome.faultCase();
			DcResult result = outcome.result();
			if (result instanceof DcSolution solution) {
				solved.add(new SolvedCase(c, solution));
				caseResults.add(new CaseResult(c.name(), c.kind(), true, Stresses.of(compiled, solution)));
			} else {
				solverFailed = true;
				caseResults.add(new CaseResult(c.name(), c.kind(), false, List.of()));
				findings.add(solverFinding(compiled, c, (SolveFailure) result));
			}
		}
		CheckContext context = new CheckContext(compiled, solved);
		for (Rule rule : RuleRegistry.all()) {
			rule.check(context, findings::add);
		}
		findings = new ArrayList<>(Waivers.apply(design, findings));
		findings.sort(Comparator.comparingInt((Finding f) -> f.location().line())
				.thenComparingInt(f -> f.location().column()));
		Status status = solverFailed ? Status.ERROR
				: findings.stream().anyMatch(f -> f.severity() == Severity.ERROR && !f.waived()) ? Status.FAIL
						: Status.PASS;
		return new DesignResult(loaded.file(), title, status, findings, caseResults);
	}

	/** A design refused before it was read: one finding saying why, status error. */
	static DesignResult notChecked(String file, String reason, SourceLocation where) {
		return new DesignResult(file, null, Status.ERROR,
				List.of(Finding.plain("file", Concern.STRUCTURE, Severity.ERROR, reason, null, where)), List.of());
	}

	private static Finding solverFinding(CompiledDesign compiled, FaultCase c, SolveFailure failure) {
		SourceLocation where = SourceLocation.NONE;
		String part = null;
		if (failure.place() != null) {
			if (compiled.parts().containsKey(failure.place())) {
				part = failure.place();
				where = Locations.of(compiled.parts().get(part), DesignPackage.Literals.MEMBER__NAME);
			} else {
				for (Member m : compiled.design().getMembers()) {
					// a net by its name, or a case by the devices it adds ("case NAME #k")
					if (failure.place().equals(m.getName())
							|| m instanceof bulwark.lang.design.Case && failure.place().startsWith("case " + m.getName() + " #")) {
						where = Locations.of(m, DesignPackage.Literals.MEMBER__NAME);
					}
				}
			}
		}
		String reason = failure.reason().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
		return new Finding("solver", Concern.SOLVER, Severity.ERROR,
				"case '" + c.name() + "' could not be solved (" + reason + "): " + failure.message(), part, c.name(),
				where, null, null, null, false);
	}
}
