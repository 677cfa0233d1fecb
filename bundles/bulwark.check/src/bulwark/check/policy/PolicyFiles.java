package bulwark.check.policy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ConcurrentMap;

import bulwark.check.finding.CheckerRules;
import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleId;
import bulwark.check.load.InputLimits;
import bulwark.check.finding.LanguageFindings;
import bulwark.check.finding.Severity;
import bulwark.check.load.DesignLoader;
import bulwark.check.load.LoadedPolicy;
import bulwark.check.load.TextFiles;

/**
 * Reads review policy files, once per file version: a batch of a thousand designs naming one policy parses
 * it once. A policy with errors yields no policy, only its located problems; a design is never checked
 * under half a policy.
 */
public final class PolicyFiles {
	/** A policy as read: the policy, or the problems that stop it from being used (each naming the file). */
	public record Resolution(Optional<ReviewPolicy> policy, List<Finding> problems) {
	}

	private record Version(Path file, FileTime modified, long size) {
	}

	private final DesignLoader loader;
	private final ConcurrentMap<Version, Resolution> cache = new ConcurrentHashMap<>();

	private final Set<RuleId> rules;

	/** @param rules the rules whose severity a policy may set */
	public PolicyFiles(DesignLoader loader, Set<RuleId> rules) {
		this.loader = loader;
		this.rules = Set.copyOf(rules);
	}

	public Resolution read(Path file) {
		Path real;
		Version version;
		try {
			real = file.toRealPath();
			version = new Version(real, Files.getLastModifiedTime(real), Files.size(real));
		} catch (java.nio.file.NoSuchFileException e) {
			return failed("there is no review policy " + file);
		} catch (IOException e) {
			return failed("cannot read the review policy " + file + ": " + e.getMessage());
		}
		return cache.computeIfAbsent(version, v -> load(v.file()));
	}

	/** Parses a policy text; {@code name} is how messages call the file. */
	public Resolution parse(String text, String name) {
		Optional<Finding> refused = InputLimits.check(text);
		if (refused.isPresent()) {
			return failed(name + ": " + refused.get().message());
		}
		LoadedPolicy loaded = loader.loadPolicy(text, name);
		List<Finding> problems = new ArrayList<>();
		boolean errors = false;
		for (var issue : loaded.issues()) {
			Finding f = LanguageFindings.of(issue);
			if (f.severity() == Severity.ERROR) {
				errors = true;
				problems.add(inFile(f, name));
			}
		}
		if (errors || loaded.policy() == null) {
			if (loaded.policy() != null) {
				PolicyCompiler.unknownRules(loaded.policy(), rules).forEach(f -> problems.add(inFile(f, name)));
			}
			if (problems.isEmpty()) {
				problems.add(inFile(Finding.of(CheckerRules.POLICY, "holds no review policy"), name));
			}
			return new Resolution(Optional.empty(), problems);
		}
		ReviewPolicy policy = PolicyCompiler.compile(loaded.policy(), rules, f -> problems.add(inFile(f, name)));
		return problems.isEmpty() ? new Resolution(Optional.of(policy), List.of())
				: new Resolution(Optional.empty(), problems);
	}

	private Resolution load(Path file) {
		TextFiles.Read read = TextFiles.read(file, "the review policy");
		return read instanceof TextFiles.Text t ? parse(t.text(), file.toString())
				: failed(((TextFiles.Refused) read).reason());
	}

	/** A problem of the policy file, its place in that file written into the message. */
	private static Finding inFile(Finding f, String name) {
		String where = f.location().line() > 0 ? name + ":" + f.location().line() + ":" + f.location().column()
				: name;
		return Finding.of(CheckerRules.POLICY, "review policy " + where + ": " + f.message()).withSeverity(f.severity());
	}

	private static Resolution failed(String message) {
		return new Resolution(Optional.empty(), List.of(Finding.of(CheckerRules.POLICY, message)));
	}
}
