package bulwark.lang.library;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;

/**
 * A file a design names relative to a folder, kept inside that folder: no absolute name, no {@code ..} that
 * climbs out, no link that points out. Libraries (against each folder of the library path) and review
 * policies (against the design's folder) are both confined by it.
 */
public final class Confinement {
	/** Where a name leads from a folder. */
	public enum Verdict {
		/** Inside the folder (the file may or may not exist). */
		INSIDE,
		/** The name climbs out of the folder. */
		CLIMBS_OUT,
		/** The file exists, but it or a folder on its way is a link to somewhere outside. */
		LINKS_OUT,
		/** The file exists but its real place could not be read. */
		UNREADABLE
	}

	/** The verdict and, when inside, the file. */
	public record Place(Verdict verdict, Path file, String problem) {
		public boolean inside() {
			return verdict == Verdict.INSIDE;
		}
	}

	private Confinement() {
	}

	/**
	 * The written name as a relative path, or null when it is not one: blank, not a file name, absolute, with a
	 * drive or a home folder in it.
	 */
	public static Path relativeName(String written) {
		if (written == null || written.isBlank() || written.contains(":") || written.startsWith("~")) {
			return null;
		}
		try {
			Path p = Path.of(written);
			return p.isAbsolute() ? null : p;
		} catch (InvalidPathException e) {
			return null;
		}
	}

	/** Where {@code relative} leads from {@code folder}. */
	public static Place within(Path folder, Path relative) {
		Path root = folder.toAbsolutePath().normalize();
		Path candidate = root.resolve(relative).normalize();
		if (!candidate.startsWith(root)) {
			return new Place(Verdict.CLIMBS_OUT, null, "'" + relative + "' leaves " + root);
		}
		if (Files.exists(candidate)) {
			try {
				if (!candidate.toRealPath().startsWith(root.toRealPath())) {
					return new Place(Verdict.LINKS_OUT, null, "'" + relative + "' links to a file outside " + root);
				}
			} catch (IOException e) {
				return new Place(Verdict.UNREADABLE, null, "cannot read '" + relative + "': " + e.getMessage());
			}
		}
		return new Place(Verdict.INSIDE, candidate, null);
	}
}
