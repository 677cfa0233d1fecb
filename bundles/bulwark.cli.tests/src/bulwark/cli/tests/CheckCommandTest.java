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
		// with the indicator output shorted, 12 V across 150 Ω: 12²/150 = 0.96 W [closed form, Joule's law],
		// against 125 mW derated to 60 % (NASA EEE-INST-002): 75 mW, 1280 %
		assertEquals(CliRun.example(LAB) + ":22:10: error resistor-power R_DROP: power 960 mW in case "
				+ "'normal, LAMP_OUT shorted to LAMP_RET', over its rated 125 mW derated to 60 % (75 mW), 12.8× the limit",
				lines.get(0));
	}

	@Test
	void warningAloneExitsZero(@TempDir Path dir) throws Exception {
		Path unrated = dir.resolve("unrated.bulwark");
		Files.writeString(unrated, "design \"unrated\"\nreference net gnd\nnet a\n"
				+ "source V1 (plus: a, minus: gnd) { voltage 5 V }\nresistor R1 (a: a, b: gnd) { value 1 kΩ rated voltage 150 V }\n");
		CliRun run = CliRun.of("check", unrated.toString());
		assertEquals(0, run.exitCode(), run.err());
		assertTrue(run.out().contains(":5:10: warning rating-missing R1 has no rating for power (resistor-power)"), run.out());
		// never a plain pass: the summary, the JSON status and the JUnit case say a part went unchecked
		assertTrue(run.err().contains("1 design(s) checked: 0 pass, 1 pass with unchecked parts, 0 fail, 0 not checked"),
				run.err());
		CliRun json = CliRun.of("check", "--format", "json", unrated.toString());
		assertEquals("pass-unchecked", JsonParser.parseString(json.out()).getAsJsonObject().getAsJsonArray("designs")
				.get(0).getAsJsonObject().get("status").getAsString());
		CliRun junit = CliRun.of("check", "--format", "junit", unrated.toString());
		assertTrue(junit.out().contains("name=\"rating-missing\"><skipped message=\"1 part(s) not checked: R1 has no rating"),
				junit.out());
		assertTrue(!CliRun.of("check", CliRun.example(GREENHOUSE)).err().contains("unchecked"), "a plain pass says nothing of it");
	}

	@Test
	void aDesignOverItsBudgetLeavesTheOthersReported(@TempDir Path dir) throws Exception {
		// 60 terminals, each abused against every other: far more than a second of solving
		StringBuilder heavy = new StringBuilder("design \"heavy\"\nreference net gnd\nterminal T0 \"ret\" at gnd common\n");
		for (int i = 1; i < 60; i++) {
			heavy.append("net n").append(i).append("\nterminal T").append(i).append(" \"t").append(i).append("\" at n").append(i)
					.append("\nresistor R").append(i).append(" (a: n").append(i).append(", b: gnd) { value 100 kΩ package 2512 }\n");
		}
		Files.writeString(dir.resolve("b-heavy.bulwark"), heavy);
		Files.writeString(dir.resolve("a-unrated.bulwark"), "design \"unrated\"\nreference net gnd\nnet a\n"
				+ "source V1 (plus: a, minus: gnd) { voltage 5 V }\nresistor R1 (a: a, b: gnd) { value 1 kΩ rated voltage 150 V }\n");
		Files.copy(Path.of(CliRun.example(LAB)), dir.resolve("c-lab.bulwark"));
		Files.copy(Path.of(CliRun.example("teaching-lab.bulwark-policy")), dir.resolve("teaching-lab.bulwark-policy"));
		CliRun run = CliRun.of("check", "--budget", "1", "--jobs", "1", dir.toString());
		assertEquals(2, run.exitCode(), run.err());
		assertTrue(run.out().contains("a-unrated.bulwark:5:10: warning rating-missing"), run.out());
		assertTrue(run.out().contains("c-lab.bulwark:22:10: error resistor-power"), run.out());
		assertTrue(run.out().lines().anyMatch(l -> l.contains("b-heavy.bulwark:") && (l.contains(" budget ") || l.contains("too large"))),
				run.out());
		assertTrue(run.err().contains("3 design(s) checked: 0 pass, 1 pass with unchecked parts, 1 fail, 1 not checked"), run.err());
	}

	@Test
	void mainsOnTheLoomCheckerIsFoundWithItsPath() {
		CliRun run = CliRun.of("check", "--format", "json", CliRun.example(LOOM));
		assertEquals(1, run.exitCode(), run.err());
		JsonObject loom = JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonArray("designs").get(0)
				.getAsJsonObject();
		assertEquals("built-in policy", loom.get("policy").getAsString());
		JsonObject power = null, path = null;
		for (var e : loom.getAsJsonArray("findings")) {
			JsonObject f = e.getAsJsonObject();
			if (f.get("part").isJsonNull()) {
				continue; // a finding about the whole design, such as a requirement
			}
			if ("R_LIMIT".equals(f.get("part").getAsString()) && f.get("rule").getAsString().equals("resistor-power")) {
				power = f;
			}
			if ("R_LIMIT".equals(f.get("part").getAsString()) && f.get("rule").getAsString().equals("reverse-path")) {
				path = f;
			}
		}
		// the sine v = 357.8 V·sin θ (253 V·√2, IEC 60038 + 10 %) in series with the 9 V cell, its 1.7 Ω and
		// R_LIMIT: i = (v ∓ 9)/681.7, and over the cycle the cross term averages out, so
		// P = (Vp²/2 + 9²)·680/681.7² = 93.8 W — not the 197 W of the crest [closed form, mean of sin²]
		double vp = 253 * Math.sqrt(2);
		assertEquals((vp * vp / 2 + 81) * 680 / (681.7 * 681.7), power.get("value").getAsDouble(), 1e-6);
		assertEquals(0.25 * 0.6, power.get("limit").getAsDouble(), 1e-12);
		assertEquals("W", power.get("unit").getAsString());
		// the whole cycle, which the average is over, between the pair of terminals the path runs between
		assertTrue(power.get("case").getAsString().matches("230 V 50 Hz mains \\(358 V peak\\), between (SCREEN and CORE|CORE and SCREEN)"),
				power.get("case").getAsString());
		assertEquals("reverse-path", path.get("concern").getAsString());
		assertTrue(path.get("message").getAsString().contains("SCREEN → B1 → net bat → R_LIMIT → CORE"),
				path.get("message").getAsString());
		// every part's worst stress per rating, with its limit
		JsonObject worst = null;
		for (var e : loom.getAsJsonArray("stresses")) {
			JsonObject s = e.getAsJsonObject();
			if (s.get("part").getAsString().equals("R_LIMIT") && s.get("rating").getAsString().equals("power")) {
				worst = s;
			}
		}
		assertEquals((vp * vp / 2 + 81) * 680 / (681.7 * 681.7) / 0.15, worst.get("utilisation").getAsDouble(), 1e-6);
		assertEquals(0.6, worst.get("derating").getAsDouble(), 0);
	}

	@Test
	void libraryOptionAddsAFolder(@TempDir Path dir) throws Exception {
		Path shared = Files.createDirectories(dir.resolve("shared"));
		Files.writeString(shared.resolve("parts.bulwark"), "library \"shared\"\ndefine resistor R_STD { package 0805 rated power 250 mW }\n");
		Path design = Files.createDirectories(dir.resolve("designs")).resolve("d.bulwark");
		Files.writeString(design, "design \"d\"\nuse \"parts.bulwark\"\nreference net gnd\nnet a\n"
				+ "source V1 (plus: a, minus: gnd) { voltage 5 V }\nresistor R1 (a: a, b: gnd) is R_STD { value 1 kΩ }\n");
		assertEquals(2, CliRun.of("check", design.toString()).exitCode(), "not found without the library path");
		CliRun run = CliRun.of("check", "--library", shared.toString(), design.toString());
		assertEquals(0, run.exitCode(), run.out() + run.err());
		assertEquals("", run.out());
		// the folder belongs to that run only
		assertEquals(2, CliRun.of("check", design.toString()).exitCode(), "the next run without --library");
	}

	@Test
	void policyOptionAppliesToEveryDesign(@TempDir Path dir) throws Exception {
		// the teaching lab's policy applies no mains: the loom checker then only misses its battery life
		CliRun lab = CliRun.of("check", "--policy", CliRun.root().resolve("examples/teaching-lab.bulwark-policy").toString(),
				CliRun.example(LOOM));
		assertEquals(1, lab.exitCode(), lab.err() + lab.out());
		assertTrue(lab.out().contains("error requirement battery life is 8205 h"), lab.out());
		assertTrue(!lab.out().contains("mains"), lab.out());
		Path bad = dir.resolve("bad.bulwark-policy");
		Files.writeString(bad, "policy \"bad\"\n  derate resistor power to 0 %\n");
		CliRun refused = CliRun.of("check", "--policy", bad.toString(), CliRun.example(LOOM));
		assertEquals(2, refused.exitCode());
		assertTrue(refused.err().contains(bad + ":2:"), refused.err());
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
		// 12 V across 150 Ω in series with the generated 1 mΩ short: (12 / 150.001)²·150 [closed form]; the
		// rest of the circuit, megohms away, moves it by parts in 10¹⁰
		assertEquals(Math.pow(12 / (150 + 1e-3), 2) * 150, finding.get("value").getAsDouble(), 1e-9);
		assertEquals(0.125 * 0.6, finding.get("limit").getAsDouble(), 1e-15);
		assertEquals("Teaching lab, bench supply only", lab.get("policy").getAsString());
		JsonObject normal = lab.getAsJsonArray("cases").get(0).getAsJsonObject();
		assertEquals("normal", normal.get("kind").getAsString());
		assertTrue(normal.get("converged").getAsBoolean());
		JsonObject drop = normal.getAsJsonArray("parts").get(1).getAsJsonObject();
		assertEquals("R_DROP", drop.get("part").getAsString());
		// open: 12 V over 150 Ω + 100 Ω, 48 mA, 0.3456 W [closed form], against 75 mW
		assertEquals(0.3456 / 0.075, drop.get("utilisation").getAsDouble(), 1e-12);
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
		assertTrue(run.err().contains("6 design(s) checked: 1 pass, 5 fail, 0 not checked"), run.err());
		CliRun help = CliRun.of("--help");
		assertEquals(0, help.exitCode());
		assertTrue(help.out().contains("IEC 61010-1"), help.out());
	}

	@Test
	void singleFaultsAreAnalysedOnAskingForThem() {
		// every demo design, every part failed in turn under the built-in policy (mains as waveforms included):
		// never a fault of Bulwark's own; the capacitive dropper shorted puts the mains on the surge resistor, the
		// bilge switch tester's transistor does not survive its base resistor shorted
		CliRun socket = CliRun.of("check", "--single-faults", CliRun.example("socket-live-indicator.bulwark"));
		assertTrue(socket.out().contains("warning single-fault with C_DROP short, case "), socket.out());
		assertTrue(!socket.out().contains("internal"), socket.out());
		CliRun marina = CliRun.of("check", "--single-faults", CliRun.example("marina-bilge-switch-tester.bulwark"));
		assertTrue(marina.out().contains("warning single-fault with R_BASE short, case "), marina.out());
		CliRun all = CliRun.of("check", "--single-faults", CliRun.root().resolve("examples").toString());
		assertTrue(all.err().contains("0 not checked"), all.err());
		CliRun without = CliRun.of("check", CliRun.example("marina-bilge-switch-tester.bulwark"));
		assertTrue(!without.out().contains("single-fault"), without.out());
	}
}
