package bulwark.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/** Exit codes, text lines and the JSON contract on the demo designs. */
class CheckCommandTest {
	private static final String LAB = "lab-indicator-seeded.bulwark";
	private static final String GREENHOUSE = "greenhouse-vent-input.bulwark";
	private static final String LOOM = "stage-loom-checker.bulwark";

	@Test
	void cleanDesignExitsZero() {
		CliRun run = CliRun.of("check", CliRun.example(GREENHOUSE));
		assertEquals(0, run.exitCode(), run.err());
		assertEquals("", run.out());
	}

	@Test
	void powerFindingExitsOneWithTextLine() {
		CliRun run = CliRun.of("check", CliRun.example(LAB));
		assertEquals(1, run.exitCode(), run.err());
		List<String> lines = run.out().lines().toList();
		assertEquals(1, lines.size(), run.out());
		// 12 V over 150 Ω + 100 Ω: 48 mA, 0.3456 W in R_DROP [closed form, Joule's law]
		assertEquals(CliRun.example(LAB) + ":20:10: error resistor-power R_DROP dissipates 346 mW in case "
				+ "'normal, terminals open', over its rated 125 mW (276 % of rating)", lines.get(0));
	}

	@Test
	void warningAloneExitsZero() {
		CliRun run = CliRun.of("check", CliRun.example(LOOM));
		assertEquals(0, run.exitCode(), run.err());
		assertTrue(run.out().contains(": warning rating-missing R_READ has no power rating"), run.out());
	}

	@Test
	void jsonFollowsTheContract() {
		CliRun run = CliRun.of("check", "--format", "json", CliRun.example(LAB), CliRun.example(GREENHOUSE));
		assertEquals(1, run.exitCode(), run.err());
		JsonObject root = JsonParser.parseString(run.out()).getAsJsonObject();
		assertEquals("bulwark", root.getAsJsonObject("tool").get("name").getAsString());
		JsonArray designs = root.getAsJsonArray("designs");
		assertEquals(2, designs.size());
		JsonObject lab = designs.get(0).getAsJsonObject();
		assertEquals("fail", lab.get("status").getAsString());
		JsonObject finding = lab.getAsJsonArray("findings").get(0).getAsJsonObject();
		for (String key : List.of("rule", "concern", "severity", "message", "part", "case", "line", "column", "value",
				"limit", "unit", "waived")) {
			assertTrue(finding.has(key), "finding lacks " + key);
		}
		assertEquals("power", finding.get("concern").getAsString());
		assertEquals(0.048 * 0.048 * 150, finding.get("value").getAsDouble(), 1e-12);
		assertEquals(0.125, finding.get("limit").getAsDouble(), 0);
		JsonObject normal = lab.getAsJsonArray("cases").get(0).getAsJsonObject();
		assertEquals("normal", normal.get("kind").getAsString());
		assertTrue(normal.get("converged").getAsBoolean());
		JsonObject drop = normal.getAsJsonArray("parts").get(1).getAsJsonObject();
		assertEquals("R_DROP", drop.get("part").getAsString());
		assertEquals(0.3456 / 0.125, drop.get("utilisation").getAsDouble(), 1e-12);
		assertEquals("power", drop.get("limiting").getAsString());
		assertTrue(lab.has("function"));
		assertEquals("pass", designs.get(1).getAsJsonObject().get("status").getAsString());
	}

	@Test
	void syntaxErrorExitsTwo(@TempDir Path dir) throws Exception {
		Path bad = dir.resolve("bad.bulwark");
		Files.writeString(bad, "design \"x\"\nreference net gnd\nresistor R1 (a gnd) { }\n");
		CliRun run = CliRun.of("check", bad.toString());
		assertEquals(2, run.exitCode());
		assertTrue(run.out().startsWith(bad + ":3:"), run.out());
		assertTrue(run.out().contains(": error syntax "), run.out());
	}

	@Test
	void missingFileExitsTwo() {
		assertEquals(2, CliRun.of("check", "does-not-exist.bulwark").exitCode());
	}

	@Test
	void usageErrorsExitThree() {
		assertEquals(3, CliRun.of("check").exitCode());
		assertEquals(3, CliRun.of("check", "--format", "pdf", CliRun.example(LAB)).exitCode());
		assertEquals(3, CliRun.of("no-such-command").exitCode());
	}

	@Test
	void outWritesTheReportToAFile(@TempDir Path dir) throws Exception {
		Path report = dir.resolve("sub/report.json");
		CliRun run = CliRun.of("check", "--format", "json", "--out", report.toString(), CliRun.example(GREENHOUSE));
		assertEquals(0, run.exitCode(), run.err());
		assertEquals("", run.out());
		assertTrue(Files.readString(report).contains("\"status\": \"pass\""));
		try (var files = Files.list(report.getParent())) {
			assertEquals(1, files.count(), "no temporary file left behind");
		}
	}

	@Test
	void folderIsSearchedAndHelpMentionsSafety() {
		CliRun run = CliRun.of("check", CliRun.root().resolve("examples").toString());
		assertEquals(1, run.exitCode(), run.err());
		assertTrue(run.err().contains("4 design(s) checked: 3 pass, 1 fail, 0 not checked"), run.err());
		CliRun help = CliRun.of("--help");
		assertEquals(0, help.exitCode());
		assertTrue(help.out().contains("IEC 61010-1"), help.out());
	}
}
