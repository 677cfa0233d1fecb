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
		assertTrue(temporarySize(dir) >= 1_000_000, "the killed save left its temporary file");
		// the next save of that file removes what the killed one left
		AtomicFile.write(design, "design \"next\"\n", false);
		assertEquals(0, temporarySize(dir), "a stale temporary file of our own is removed");
		assertEquals("design \"next\"\n", Files.readString(design));
	}

	@Test
	void aLinkStaysALinkAndItsTargetGetsTheText(@TempDir Path dir) throws Exception {
		Path real = Files.createDirectories(dir.resolve("shared")).resolve("input.bulwark");
		Files.writeString(real, "first\n");
		Path link = Files.createSymbolicLink(dir.resolve("input.bulwark"), Path.of("shared", "input.bulwark"));
		AtomicFile.write(link, "second\n", true);
		assertTrue(Files.isSymbolicLink(link), "the link was replaced by a file");
		assertEquals("second\n", Files.readString(real));
		assertEquals("first\n", Files.readString(real.resolveSibling("input.bulwark.bak")), "the backup sits by the target");
	}

	@Test
	void aFileKeepsItsPermissionsAndANewOneGetsTheUsualOnes(@TempDir Path dir) throws Exception {
		Path design = dir.resolve("input.bulwark");
		Files.writeString(design, "first\n");
		var groupWritable = java.nio.file.attribute.PosixFilePermissions.fromString("rw-rw-r--");
		Files.setPosixFilePermissions(design, groupWritable);
		AtomicFile.write(design, "second\n", true);
		assertEquals(groupWritable, Files.getPosixFilePermissions(design));
		// a new file: what any program's new file gets under this umask, not a temporary file's owner-only mode
		Path probe = Files.createFile(dir.resolve("probe"));
		Path fresh = dir.resolve("fresh.bulwark");
		AtomicFile.write(fresh, "new\n", false);
		assertEquals(Files.getPosixFilePermissions(probe), Files.getPosixFilePermissions(fresh));
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
