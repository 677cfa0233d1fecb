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
		Files.copy(old.resolveSibling("teaching-lab.bulwark-policy"), dir.resolve("teaching-lab.bulwark-policy"));
		Files.writeString(fixed, Files.readString(old).replace("rated power 125 mW", "rated power 2 W"));
		CliRun run = CliRun.of("compare", old.toString(), fixed.toString());
		assertEquals(0, run.exitCode(), run.err());
		assertTrue(run.out().contains("fixed    error resistor-power R_DROP: power 960 mW"), run.out());
		// 0.96 W against 125 mW, then 2 W, each derated to 60 % [closed form]: 1280 % → 80 %
		assertTrue(run.out().contains("better   R_DROP worst utilisation 1280 % → 80 %"), run.out());

		CliRun back = CliRun.of("compare", fixed.toString(), old.toString());
		assertEquals(1, back.exitCode(), "a new error fails the comparison");
		assertTrue(back.out().contains("new      error resistor-power"), back.out());
		assertTrue(back.out().contains("worse    R_DROP worst utilisation 80 % → 1280 %"), back.out());
	}

	/** Two revisions that check the same say so, rather than print nothing. */
	@Test
	void theSameDesignTwiceHasNoDifferences() {
		String lab = CliRun.root().resolve("examples/lab-indicator-seeded.bulwark").toString();
		CliRun run = CliRun.of("compare", lab, lab);
		assertEquals(0, run.exitCode(), run.err());
		assertEquals("no differences: the same findings, and every rated part's worst utilisation within 0.5 percentage "
				+ "points of what it was", run.out().strip());
	}
}
