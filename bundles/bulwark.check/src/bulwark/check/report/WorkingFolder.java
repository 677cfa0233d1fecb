package bulwark.check.report;

import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.Optional;

/**
 * Reports name a design from the folder Bulwark runs in when it lies below it, so that a report reads the
 * same on every machine that checks out the same tree.
 */
final class WorkingFolder {
	private WorkingFolder() {
	}

	/** The file's path from the working folder (forward or back slashes as the system writes them); empty when outside it. */
	static Optional<String> below(String file) {
		try {
			Path p = Path.of(file).normalize();
			Path here = Path.of("").toAbsolutePath();
			Path relative = !p.isAbsolute() ? p : p.startsWith(here) ? here.relativize(p) : null;
			return relative == null || relative.startsWith("..") ? Optional.empty() : Optional.of(relative.toString());
		} catch (InvalidPathException e) {
			return Optional.empty();
		}
	}
}
