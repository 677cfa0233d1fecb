package bulwark.check.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes a file so that a reader, or a crash, never sees half of it: the content goes to a temporary file
 * beside the target, is forced to disk, and is then moved over the target in one step. With a backup, the
 * previous version is kept beside it as {@code NAME.bak} (itself replaced in one step). A write that dies
 * midway leaves the target as it was, and at most a hidden temporary file.
 */
public final class AtomicFile {
	public static final String BACKUP_SUFFIX = ".bak";

	/** Writes the content to a stream; may be slow, may fail. */
	@FunctionalInterface
	public interface Content {
		void writeTo(OutputStream out) throws IOException;
	}

	private AtomicFile() {
	}

	public static void write(Path target, String text, boolean keepBackup) throws IOException {
		byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
		write(target, out -> out.write(bytes), keepBackup);
	}

	public static void write(Path target, Content content, boolean keepBackup) throws IOException {
		Path abs = target.toAbsolutePath();
		Path dir = abs.getParent();
		Files.createDirectories(dir);
		Path tmp = Files.createTempFile(dir, "." + abs.getFileName(), ".tmp");
		try {
			try (FileChannel channel = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
					OutputStream out = Channels.newOutputStream(channel)) {
				content.writeTo(out);
				out.flush();
				channel.force(true);
			}
			if (keepBackup && Files.isRegularFile(abs)) {
				Path backupTmp = Files.createTempFile(dir, "." + abs.getFileName(), ".bak.tmp");
				try {
					Files.copy(abs, backupTmp, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.COPY_ATTRIBUTES);
					move(backupTmp, dir.resolve(abs.getFileName() + BACKUP_SUFFIX));
				} finally {
					Files.deleteIfExists(backupTmp);
				}
			}
			move(tmp, abs);
		} finally {
			Files.deleteIfExists(tmp);
		}
	}

	private static void move(Path from, Path to) throws IOException {
		try {
			Files.move(from, to, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
		} catch (AtomicMoveNotSupportedException e) {
			// a file system without atomic rename (rare on local disks): the plain move is the best there is
			Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
		}
	}
}
