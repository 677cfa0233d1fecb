package bulwark.cli.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every output carries the safety caution: each report format of a check, solve, compare, explain,
 * tolerance and the classroom's summaries. An output that drops it fails here.
 */
class CautionEverywhereTest {
	private static final String MARK = "IEC 61010-1";
	private static final String LAB = CliRun.example("lab-indicator-seeded.bulwark");

	private static void carries(String what, CliRun run) {
		assertTrue(run.out().contains(MARK) || run.err().contains(MARK), what + " has no caution:\n" + run.out() + run.err());
	}

	@Test
	void everyCheckFormat() {
		for (String format : List.of("text", "json", "sarif", "junit", "html")) {
			carries("check --format " + format, CliRun.of("check", "--format", format, LAB));
		}
	}

	@Test
	void theOtherCommands() {
		carries("solve", CliRun.of("solve", LAB));
		carries("solve --format json", CliRun.of("solve", "--format", "json", LAB));
		carries("compare", CliRun.of("compare", LAB, LAB));
		carries("explain", CliRun.of("explain", "resistor-power"));
		carries("tolerance", CliRun.of("tolerance", "--samples", "0", LAB));
		carries("demo", CliRun.of("demo"));
	}

	@Test
	void theClassroomSummaries(@TempDir Path dir) throws Exception {
		Path designs = Files.createDirectories(dir.resolve("class"));
		Files.copy(Path.of(LAB), designs.resolve("ana.bulwark"));
		Path out = dir.resolve("out");
		CliRun.of("classroom", designs.toString(), "--policy", CliRun.example("teaching-lab.bulwark-policy"), "--out",
				out.toString());
		for (String file : List.of("summary.csv", "summary.html", "ana.html")) {
			assertTrue(Files.readString(out.resolve(file)).contains(MARK), file + " has no caution");
		}
	}
}
