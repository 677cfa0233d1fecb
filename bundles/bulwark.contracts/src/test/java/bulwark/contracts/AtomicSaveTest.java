package bulwark.contracts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import bulwark.check.io.AtomicFile;

/**
 * No data loss: a save killed midway — the process gone, as in a crash or a power cut — leaves the design as
 * it was; a finished save keeps the previous version as NAME.bak.
 */
class AtomicSaveTest {

	@Test
	void aWriteKilledMidwayLeavesTheFileAsItWas(@TempDir Path dir) throws Exception {
		Path design = dir.resolve("input.bulwark");
		Files.writeString(design, "design \"as it was\"\n");
		Process writer = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-cp",
				System.getProperty("java.class.path"), SlowWriter.class.getName(), design.toString()).inheritIO().start();
		// wait until the replacement is well under way in its temporary file, then kill the writer outright
		long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
		while (System.nanoTime() < deadline && temporarySize(dir) < 1_000_000) {
			Thread.sleep(20);
		}
		assertTrue(temporarySize(dir) >= 1_000_000, "the writer never got going");
		writer.destroyForcibly();
		assertTrue(writer.waitFor(30, TimeUnit.SECONDS));
		assertEquals("design \"as it was\"\n", Files.readString(design), "the design survives the killed save");
		assertTrue(!Files.exists(dir.resolve("input.bulwark.bak")), "no backup of a save that never finished");
	}

	@Test
	void aFinishedSaveKeepsTheVersionBefore(@TempDir Path dir) throws Exception {
		Path design = dir.resolve("input.bulwark");
		Files.writeString(design, "first\n");
		AtomicFile.write(design, "second\n", true);
		assertEquals("second\n", Files.readString(design));
		assertEquals("first\n", Files.readString(dir.resolve("input.bulwark.bak")));
		try (var files = Files.list(dir)) {
			assertEquals(2, files.count(), "no temporary file left behind");
		}
	}

	private static long temporarySize(Path dir) throws Exception {
		try (var files = Files.list(dir)) {
			return files.filter(p -> p.getFileName().toString().endsWith(".tmp")).mapToLong(p -> p.toFile().length()).sum();
		}
	}
}
