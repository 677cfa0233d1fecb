package bulwark.check.report;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import com.google.gson.stream.JsonWriter;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.Status;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;
import bulwark.check.rules.RuleRegistry;

/**
 * Findings as a SARIF 2.1.0 log (OASIS Static Analysis Results Interchange Format): one run, the rules with
 * their help text, one result per finding located at the part's declaration, waived findings as
 * suppressions with their justification. Bulwark's own figures (concern, part, case, value, limit, unit)
 * ride in each result's property bag. Strings are written by a JSON writer, so every value from a design is
 * escaped.
 */
public final class SarifReport {
	private SarifReport() {
	}

	/**
	 * @param help the explanation of a rule by its ID (the docs/rules page), or null when there is none
	 */
	public static void write(List<DesignResult> results, String version, String caution, Function<RuleId, String> help,
			Writer out) throws IOException {
		JsonWriter w = new JsonWriter(out);
		w.setIndent("  ");
		w.beginObject();
		w.name("version").value("2.1.0");
		w.name("runs").beginArray().beginObject();
		Map<RuleId, Integer> index = tool(w, version, help);
		// files below the folder Bulwark runs in are named from it, so that a log reads the same on every machine
		w.name("originalUriBaseIds").beginObject().name(SRCROOT).beginObject()
				.name("uri").value(Path.of("").toAbsolutePath().toUri().toString()).endObject().endObject();
		w.name("properties").beginObject().name("policies").beginArray();
		for (String policy : results.stream().map(DesignResult::policy).filter(p -> p != null).distinct().toList()) {
			w.value(policy);
		}
		w.endArray().endObject();
		w.name("invocations").beginArray().beginObject();
		w.name("executionSuccessful").value(results.stream().noneMatch(r -> r.status() == Status.ERROR));
		w.name("toolExecutionNotifications").beginArray();
		w.beginObject().name("level").value("note").name("message").beginObject().name("text").value(caution).endObject()
				.endObject();
		w.endArray();
		w.endObject().endArray();
		w.name("results").beginArray();
		for (DesignResult r : results) {
			for (Finding f : r.findings()) {
				result(w, r, f, index);
			}
		}
		w.endArray();
		w.endObject().endArray();
		w.endObject();
		w.flush();
		out.write('\n');
		out.flush();
	}

	private static Map<RuleId, Integer> tool(JsonWriter w, String version, Function<RuleId, String> help)
			throws IOException {
		Map<RuleId, Integer> index = new HashMap<>();
		w.name("tool").beginObject().name("driver").beginObject();
		w.name("name").value("Bulwark");
		w.name("version").value(version);
		w.name("rules").beginArray();
		for (RuleInfo info : RuleRegistry.findingKinds()) {
			index.put(info.id(), index.size());
			descriptor(w, info.id().text(), info.summary(), level(info.severity()), info.concern().id(), help.apply(info.id()));
		}
		w.endArray();
		w.endObject().endObject();
		return index;
	}

	private static void descriptor(JsonWriter w, String id, String summary, String level, String concern, String help)
			throws IOException {
		w.beginObject();
		w.name("id").value(id);
		w.name("shortDescription").beginObject().name("text").value(summary).endObject();
		if (help != null) {
			w.name("help").beginObject().name("text").value(help).name("markdown").value(help).endObject();
		}
		w.name("defaultConfiguration").beginObject().name("level").value(level).endObject();
		if (concern != null) {
			w.name("properties").beginObject().name("concern").value(concern).endObject();
		}
		w.endObject();
	}

	private static void result(JsonWriter w, DesignResult r, Finding f, Map<RuleId, Integer> index) throws IOException {
		w.beginObject();
		w.name("ruleId").value(f.rule().text());
		Integer i = index.get(f.rule());
		if (i != null) {
			w.name("ruleIndex").value(i);
		}
		w.name("level").value(level(f.severity()));
		w.name("message").beginObject().name("text").value(f.message()).endObject();
		w.name("locations").beginArray().beginObject().name("physicalLocation").beginObject();
		artifact(w, r.file());
		if (f.location().line() > 0) {
			w.name("region").beginObject().name("startLine").value(f.location().line());
			if (f.location().column() > 0) {
				w.name("startColumn").value(f.location().column());
			}
			w.endObject();
		}
		w.endObject().endObject().endArray();
		// what identifies the finding across edits that do not touch it: its rule and part, not its line or figures
		w.name("partialFingerprints").beginObject().name("bulwarkFinding/v1").value(fingerprint(f)).endObject();
		if (f.waived()) {
			w.name("suppressions").beginArray().beginObject().name("kind").value("inSource").name("justification")
					.value(f.justification().orElse(f.message())).endObject().endArray();
		}
		w.name("properties").beginObject();
		if (r.policy() != null) {
			w.name("policy").value(r.policy());
		}
		w.name("concern").value(f.concern().id());
		if (f.part() != null) {
			w.name("part").value(f.part());
		}
		if (f.caseName() != null) {
			w.name("case").value(f.caseName());
		}
		if (f.value() != null && Double.isFinite(f.value())) {
			w.name("value").value(f.value());
		}
		if (f.limit() != null && Double.isFinite(f.limit())) {
			w.name("limit").value(f.limit());
		}
		if (f.unit() != null) {
			w.name("unit").value(f.unit());
		}
		w.endObject();
		w.endObject();
	}

	private static final String SRCROOT = "SRCROOT";

	/** The file's location: relative to %SRCROOT% (the folder Bulwark runs in) when below it, else absolute. */
	private static void artifact(JsonWriter w, String file) throws IOException {
		w.name("artifactLocation").beginObject();
		java.util.Optional<String> relative = WorkingFolder.below(file);
		if (relative.isPresent()) {
			w.name("uri").value(uri(relative.get())).name("uriBaseId").value(SRCROOT);
		} else {
			w.name("uri").value(uri(Path.of(file).toAbsolutePath().normalize().toString())); // outside the base: absolute
		}
		w.endObject();
	}

	/** The rule and the part (or, for a finding on no part, its message without its figures), hashed. */
	static String fingerprint(Finding f) {
		String subject = f.part() != null ? f.part() : f.message().replaceAll("[0-9.,]+", "#");
		try {
			byte[] hash = java.security.MessageDigest.getInstance("SHA-256")
					.digest((f.rule().text() + "|" + subject).getBytes(java.nio.charset.StandardCharsets.UTF_8));
			return java.util.HexFormat.of().formatHex(hash, 0, 16);
		} catch (java.security.NoSuchAlgorithmException e) {
			throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
		}
	}

	/** A relative path as written (forward slashes), as SARIF's artifact URIs are. */
	static String uri(String file) {
		Path p = Path.of(file);
		return (p.isAbsolute() ? p.toUri().toString() : file.replace('\\', '/')).replace(" ", "%20");
	}

	private static String level(Severity s) {
		return switch (s) {
		case ERROR -> "error";
		case WARNING -> "warning";
		default -> "note";
		};
	}
}
