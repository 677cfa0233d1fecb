package bulwark.contracts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;

import bulwark.cli.BulwarkCommand;

/** `bulwark check --format sarif` writes logs that the published SARIF 2.1.0 schema (OASIS) accepts. */
class SarifSchemaTest {
	private static final Path ROOT = Path.of(System.getProperty("bulwark.root", "../..")).toAbsolutePath().normalize();
	private static final ObjectMapper JSON = new ObjectMapper();

	private static JsonSchema schema() throws Exception {
		try (InputStream in = SarifSchemaTest.class.getResourceAsStream("/schema/sarif-schema-2.1.0.json")) {
			return JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V7).getSchema(in);
		}
	}

	private static String sarif(String... paths) {
		StringWriter out = new StringWriter(), err = new StringWriter();
		String[] args = new String[paths.length + 3];
		args[0] = "check";
		args[1] = "--format";
		args[2] = "sarif";
		System.arraycopy(paths, 0, args, 3, paths.length);
		BulwarkCommand.run(args, new PrintWriter(out), new PrintWriter(err));
		return out.toString();
	}

	@Test
	void theSchemaRefusesALogWithoutItsTool() throws Exception {
		// the validator is live: a run must name its tool (SARIF 2.1.0 §3.14.6)
		assertTrue(!schema().validate(JSON.readTree("{\"version\": \"2.1.0\", \"runs\": [{\"results\": []}]}")).isEmpty());
	}

	@Test
	void theDemoDesignsGiveValidLogs() throws Exception {
		String log = sarif(ROOT.resolve("examples").toString());
		JsonNode node = JSON.readTree(log);
		Set<ValidationMessage> problems = schema().validate(node);
		assertTrue(problems.isEmpty(), problems.toString());
		JsonNode run = node.get("runs").get(0);
		assertEquals("Bulwark", run.get("tool").get("driver").get("name").asText());
		JsonNode first = run.get("results").get(0);
		assertTrue(first.get("locations").get(0).get("physicalLocation").get("region").get("startLine").asInt() > 0);
		// every rule carries its explanation as help text
		for (JsonNode rule : run.get("tool").get("driver").get("rules")) {
			// the check's own findings (CheckerRules) have no rule page
			if (bulwark.check.finding.CheckerRules.ALL.stream().noneMatch(c -> c.id().text().equals(rule.get("id").asText()))) {
				assertTrue(rule.get("help").get("markdown").asText().contains("## How it is computed"), rule.toString());
			}
		}
	}

	/**
	 * What code-scanning services need to follow a finding from one run to the next: a location relative to
	 * a named base, a fingerprint that an unrelated edit (a comment that shifts every line) leaves alone, the
	 * waiver's own reason as the suppression's, and the run's policy.
	 */
	@Test
	void findingsCanBeFollowedAcrossRuns(@TempDir Path dir) throws Exception {
		String design = """
				design "waived"
				reference net gnd
				net a
				source V1 (plus: a, minus: gnd) { voltage 24 V }
				resistor R1 (a: a, b: gnd) { value 600 Ω package 0805 rated power 125 mW }
				waive "resistor-power" on R1 because "a bench fixture, never left on" by "K. Ito" on "2026-12-04"
				""";
		Path file = Files.writeString(dir.resolve("w.bulwark"), design);
		JsonNode before = JSON.readTree(sarif(file.toString()));
		assertTrue(schema().validate(before).isEmpty(), schema().validate(before).toString());
		JsonNode run = before.get("runs").get(0);
		assertTrue(run.get("originalUriBaseIds").get("SRCROOT").get("uri").asText().startsWith("file:"));
		assertEquals("built-in policy", run.get("properties").get("policies").get(0).asText());
		JsonNode result = run.get("results").get(0);
		assertEquals("a bench fixture, never left on", result.get("suppressions").get(0).get("justification").asText());
		Files.writeString(file, "# a comment that moves every line\n" + design);
		JsonNode after = JSON.readTree(sarif(file.toString())).get("runs").get(0).get("results").get(0);
		assertEquals(result.get("partialFingerprints"), after.get("partialFingerprints"));
		assertTrue(after.get("locations").get(0).get("physicalLocation").get("region").get("startLine").asInt()
				!= result.get("locations").get(0).get("physicalLocation").get("region").get("startLine").asInt());
	}

	@Test
	void hostileTextAndUnreadableFilesStillGiveValidLogs(@TempDir Path dir) throws Exception {
		Path hostile = dir.resolve("hostile \"quote\".bulwark");
		Files.writeString(hostile, "design \"</script>\\\"\\u0000\"\nreference net gnd\nresistor R1 (a: gnd, b: x) { }\n");
		Path binary = dir.resolve("binary.bulwark");
		Files.write(binary, new byte[] { 0, 1, 2, (byte) 0xff });
		String log = sarif(hostile.toString(), binary.toString());
		Set<ValidationMessage> problems = schema().validate(JSON.readTree(log));
		assertTrue(problems.isEmpty(), problems + "\n" + log);
		assertTrue(JSON.readTree(log).get("runs").get(0).get("invocations").get(0).get("executionSuccessful").asBoolean() == false);
	}
}
