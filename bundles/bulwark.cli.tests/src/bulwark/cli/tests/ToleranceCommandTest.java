package bulwark.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/** `bulwark tolerance FILE`: corners, Monte Carlo and yields, reproducible by seed. */
class ToleranceCommandTest {
	private static final String LOOM = "stage-loom-checker.bulwark";

	@Test
	void jsonReportsCornersSamplesAndYields() {
		CliRun run = CliRun.of("tolerance", "--samples", "60", "--seed", "3", "--format", "json", CliRun.example(LOOM));
		assertEquals(1, run.exitCode(), run.err()); // its battery life requirement is never met
		JsonObject root = JsonParser.parseString(run.out()).getAsJsonObject();
		assertEquals(3, root.getAsJsonArray("toleranced").size());
		assertTrue(root.getAsJsonArray("corners").size() > 0);
		JsonObject mc = root.getAsJsonObject("monte_carlo");
		assertEquals(60, mc.get("samples").getAsInt());
		assertEquals("uniform", mc.get("distribution").getAsString());
		assertTrue(mc.getAsJsonArray("yield").toString().contains("require battery_life 8766 h"), mc.toString());
		assertTrue(root.get("caution").getAsString().contains("IEC 61010-1"));
		CliRun again = CliRun.of("tolerance", "--samples", "60", "--seed", "3", "--format", "json", CliRun.example(LOOM));
		assertEquals(run.out(), again.out(), "the same seed gives the same report");
	}

	@Test
	void textAndHtml() {
		CliRun text = CliRun.of("tolerance", "--samples", "20", CliRun.example(LOOM));
		assertTrue(text.out().contains("Corners (each part at its tolerance limits"), text.out());
		assertTrue(text.out().contains("Monte Carlo (20 samples, seed 1, uniform)"), text.out());
		CliRun html = CliRun.of("tolerance", "--samples", "20", "--format", "html", CliRun.example(LOOM));
		assertTrue(html.out().startsWith("<!DOCTYPE html>") && html.out().contains("IEC 61010-1"), html.out());
		assertEquals(3, CliRun.of("tolerance", "--samples", "-1", CliRun.example(LOOM)).exitCode());
	}
}
