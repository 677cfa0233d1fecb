package bulwark.check.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.security.SecureRandom;
import java.util.regex.Pattern;

/**
 * Writes a file so that a reader, or a crash, never sees half of it: the content goes to a temporary file
 * beside the target, is forced to disk, and is then moved over the target in one step. With a backup, the
 * previous version is kept beside it as {@code NAME.bak} (itself replaced in one step). A write that dies
 * midway leaves the target as it was, and at most a hidden temporary file, which the next write of that
 * file removes.
 * <p>
 * A target that is a symbolic link is written through it (the link stays a link, its target gets the new
 * text), and a file that exists keeps its permissions; a new one gets the usual ones of the user's umask.
 */
public final class AtomicFile {
	public static final String BACKUP_SUFFIX = ".bak";
	/** Links followed before giving up, as the operating system does. */
	private static final int MAX_LINKS = 40;
	private static final SecureRandom RANDOM = new SecureRandom();

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
		Path abs = throughLinks(target.toAbsolutePath());
		Path dir = abs.getParent();
		Files.createDirectories(dir);
		removeStaleTemporaries(dir, abs.getFileName().toString());
		Path tmp = temporary(dir, abs.getFileName().toString(), "");
		try {
			try (FileChannel channel = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
					OutputStream out = Channels.newOutputStream(channel);
					FileLock held = channel.lock()) {
				// the lock says "a writer is alive" to the stale-file sweep of another write
				content.writeTo(out);
				out.flush();
				channel.force(true);
			}
			keepPermissions(abs, tmp);
			if (keepBackup && Files.isRegularFile(abs)) {
				Path backupTmp = temporary(dir, abs.getFileName().toString(), BACKUP_SUFFIX);
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

	/** The file a chain of symbolic links ends at (which need not exist yet). */
	static Path throughLinks(Path path) throws IOException {
		Path p = path;
		for (int i = 0; i < MAX_LINKS && Files.isSymbolicLink(p); i++) {
			p = p.getParent().resolve(Files.readSymbolicLink(p)).normalize();
		}
		if (Files.isSymbolicLink(p)) {
			throw new IOException(path + " is a chain of more than " + MAX_LINKS + " links");
		}
		return p;
	}

	/**
	 * A new, empty, hidden file beside the target: {@code .NAME.<digits>[.bak].tmp}. Made with the default
	 * permissions (the umask's), not the owner-only ones of a temporary file, so that a new target has them.
	 */
	private static Path temporary(Path dir, String name, String suffix) throws IOException {
		for (int tries = 0;; tries++) {
			Path p = dir.resolve("." + name + "." + Long.toUnsignedString(RANDOM.nextLong()) + suffix + ".tmp");
			try {
				return Files.createFile(p);
			} catch (java.nio.file.FileAlreadyExistsException e) {
				if (tries > 10) {
					throw e;
				}
			}
		}
	}

	/** Copies the target's permissions, if it has any yet, to the file that replaces it. */
	private static void keepPermissions(Path target, Path replacement) throws IOException {
		if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
			return;
		}
		PosixFileAttributeView view = Files.getFileAttributeView(target, PosixFileAttributeView.class);
		if (view != null) {
			Files.setPosixFilePermissions(replacement, view.readAttributes().permissions());
		}
	}

	/**
	 * Removes the temporary files an earlier write of this target left when it was killed. Only ours (by
	 * their name), and only those no live writer holds: each writer locks its temporary file while it writes,
	 * and the operating system drops the lock of a process that dies.
	 */
	private static void removeStaleTemporaries(Path dir, String name) {
		Pattern ours = Pattern.compile(Pattern.quote("." + name) + "\\.?[0-9]+(\\.bak)?\\.tmp");
		try (DirectoryStream<Path> files = Files.newDirectoryStream(dir, "." + globQuoted(name) + "*.tmp")) {
			for (Path p : files) {
				if (ours.matcher(p.getFileName().toString()).matches() && Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)
						&& !held(p)) {
					Files.deleteIfExists(p);
				}
			}
		} catch (IOException | RuntimeException e) {
			// a sweep that cannot run leaves the files for the next one; the write itself goes on
		}
	}

	private static boolean held(Path p) {
		try (FileChannel c = FileChannel.open(p, StandardOpenOption.WRITE)) {
			FileLock lock = c.tryLock();
			if (lock == null) {
				return true;
			}
			lock.release();
			return false;
		} catch (OverlappingFileLockException e) {
			return true; // a writer of this very process
		} catch (IOException e) {
			return true; // cannot tell: leave it
		}
	}

	private static String globQuoted(String name) {
		return name.replaceAll("([\\\\*?\\[\\]{}])", "\\\\$1");
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
