package bulwark.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/** `bulwark solve`: the operating point as text and as JSON. */
class SolveCommandTest {

	@Test
	void jsonOperatingPointOfTheLabDesign() {
		CliRun run = CliRun.of("solve", "--format", "json", CliRun.example("lab-indicator-seeded.bulwark"));
		assertEquals(0, run.exitCode(), run.err());
		JsonObject root = JsonParser.parseString(run.out()).getAsJsonObject();
		assertEquals("normal, terminals open", root.get("case").getAsString());
		assertTrue(root.get("converged").getAsBoolean());
		assertTrue(root.get("iterations").getAsInt() >= 1);
		// 12 V over 150 Ω + 100 Ω: the lamp net sits at 12·100/250 = 4.8 V [closed form, divider]
		assertEquals(4.8, root.getAsJsonObject("nets").get("lamp").getAsDouble(), 1e-12);
		JsonObject drop = root.getAsJsonArray("parts").get(1).getAsJsonObject();
		assertEquals("R_DROP", drop.get("part").getAsString());
		assertEquals(0.048, drop.get("current").getAsDouble(), 1e-14);
		assertEquals(12.0, drop.getAsJsonObject("pins").get("a").getAsDouble(), 0);
		assertEquals(-0.048, drop.getAsJsonObject("currents").get("b").getAsDouble(), 1e-14);
	}

	@Test
	void transistorDesignSolvesWithTheLedDark() {
		CliRun run = CliRun.of("solve", "--format", "json", CliRun.example("marina-bilge-switch-tester.bulwark"));
		assertEquals(0, run.exitCode(), run.err());
		JsonObject root = JsonParser.parseString(run.out()).getAsJsonObject();
		for (var part : root.getAsJsonArray("parts")) {
			JsonObject p = part.getAsJsonObject();
			if (p.get("part").getAsString().equals("D1")) {
				// probes open: the PNP's base is held at its emitter, so the LED carries leakage only
				assertTrue(Math.abs(p.get("current").getAsDouble()) < 1e-9, p.toString());
			}
			if (p.get("part").getAsString().equals("Z1")) {
				// the zener sits across the 3 V cell, reverse-biased by its voltage
				assertEquals(3.0, p.getAsJsonObject("reverse").get("junction").getAsDouble(), 1e-3);
			}
		}
	}

	@Test
	void textListsNetsAndParts() {
		CliRun run = CliRun.of("solve", CliRun.example("lab-indicator-seeded.bulwark"));
		assertEquals(0, run.exitCode(), run.err());
		assertTrue(run.out().startsWith("case 'normal, terminals open': solved in 1 iteration(s) (newton)"), run.out());
		assertTrue(run.out().contains("lamp             4.8 V"), run.out());
		assertTrue(run.out().contains("R_DROP     current 48 mA"), run.out());
	}

	@Test
	void solverFailureIsReportedWithExitTwo(@TempDir Path dir) throws Exception {
		Path island = dir.resolve("island.bulwark");
		Files.writeString(island, """
				design "island"
				reference net gnd
				net a
				net b
				net c
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				resistor R1 (a: a, b: gnd) { value 1 kΩ }
				resistor R2 (a: b, b: c) { value 1 kΩ }
				""");
		CliRun run = CliRun.of("solve", "--format", "json", island.toString());
		assertEquals(2, run.exitCode());
		JsonObject root = JsonParser.parseString(run.out()).getAsJsonObject();
		assertEquals(false, root.get("converged").getAsBoolean());
		assertEquals("floating-net", root.get("reason").getAsString());
		assertEquals("b", root.get("place").getAsString());
	}

	@Test
	void languageErrorsAndUnknownCases(@TempDir Path dir) throws Exception {
		Path bad = dir.resolve("bad.bulwark");
		Files.writeString(bad, "design \"x\"\nreference net gnd\nresistor R1 (a: gnd, b: nowhere) { value 1 kΩ }\n");
		CliRun run = CliRun.of("solve", bad.toString());
		assertEquals(2, run.exitCode());
		assertTrue(run.err().contains(":3:"), run.err());
		CliRun unknown = CliRun.of("solve", "--case", "no such case", CliRun.example("lab-indicator-seeded.bulwark"));
		assertEquals(3, unknown.exitCode());
		assertTrue(unknown.err().contains("'normal, terminals open'"), unknown.err());
	}
}
