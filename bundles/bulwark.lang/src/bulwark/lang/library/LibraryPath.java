package bulwark.lang.library;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eclipse.emf.common.util.URI;

/**
 * Where a {@code use "…"} finds its file: relative to the file that says it, else in a folder of the library
 * path (the system property {@value #PROPERTY}, folders separated as the platform separates paths). Never
 * outside those folders — no absolute names, no {@code ..} that climbs out, no link that points out.
 */
public final class LibraryPath {
	public static final String PROPERTY = "bulwark.library";

	/** The file found, or why there is none. */
	public record Located(Optional<Path> file, String problem) {
		static Located found(Path p) {
			return new Located(Optional.of(p), null);
		}

		static Located refused(String why) {
			return new Located(Optional.empty(), why);
		}
	}

	private LibraryPath() {
	}

	public static List<Path> folders() {
		List<Path> folders = new ArrayList<>();
		for (String f : System.getProperty(PROPERTY, "").split(File.pathSeparator)) {
			if (!f.isBlank()) {
				folders.add(Path.of(f).toAbsolutePath().normalize());
			}
		}
		return folders;
	}

	/** Locates what a file (by its resource URI) names in a {@code use}. */
	public static Located locate(URI context, String written) {
		if (written == null || written.isBlank()) {
			return Located.refused("name the library file, for example use \"lib/generic-parts.bulwark\"");
		}
		Path relative;
		try {
			relative = Path.of(written);
		} catch (InvalidPathException e) {
			return Located.refused("'" + written + "' is not a file name");
		}
		if (relative.isAbsolute() || written.contains(":") || written.startsWith("~")) {
			return Located.refused("'" + written + "' must be relative to the design's folder or the library path");
		}
		List<Path> roots = new ArrayList<>();
		if (context != null && context.isFile()) {
			Path own = Path.of(context.toFileString()).toAbsolutePath().normalize().getParent();
			if (own != null) {
				roots.add(own);
			}
		}
		roots.addAll(folders());
		boolean escapes = false;
		for (Path root : roots) {
			Path candidate = root.resolve(relative).normalize();
			if (!candidate.startsWith(root)) {
				escapes = true;
				continue;
			}
			if (Files.isRegularFile(candidate)) {
				try {
					if (!candidate.toRealPath().startsWith(root.toRealPath())) {
						return Located.refused("'" + written + "' links to a file outside " + root);
					}
				} catch (IOException e) {
					return Located.refused("cannot read '" + written + "': " + e.getMessage());
				}
				return Located.found(candidate);
			}
		}
		if (escapes) {
			return Located.refused("'" + written + "' leaves the design's folder; libraries stay in it or on the library path");
		}
		return Located.refused("no library file '" + written + "' in " + roots);
	}
}
