package bulwark.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `bulwark compare OLD NEW`: what changed between two revisions, for review. */
class CompareCommandTest {

	@Test
	void fixedFindingAndBetterUtilisation(@TempDir Path dir) throws Exception {
		Path old = CliRun.root().resolve("examples/lab-indicator-seeded.bulwark");
		Path fixed = dir.resolve("fixed.bulwark");
		Files.writeString(fixed, Files.readString(old).replace("rated power 125 mW", "rated power 500 mW"));
		CliRun run = CliRun.of("compare", old.toString(), fixed.toString());
		assertEquals(0, run.exitCode(), run.err());
		assertTrue(run.out().contains("fixed    error resistor-power R_DROP dissipates 346 mW"), run.out());
		// 0.3456 W against 125 mW, then against 500 mW [closed form]: 276 % → 69 %
		assertTrue(run.out().contains("better   R_DROP worst utilisation 276 % → 69 %"), run.out());

		CliRun back = CliRun.of("compare", fixed.toString(), old.toString());
		assertEquals(1, back.exitCode(), "a new error fails the comparison");
		assertTrue(back.out().contains("new      error resistor-power"), back.out());
		assertTrue(back.out().contains("worse    R_DROP worst utilisation 69 % → 276 %"), back.out());
	}
}
