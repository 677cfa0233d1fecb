package bulwark.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * Expands the paths given on the command line: files as given, folders searched for design files. A parts
 * library in a folder (a file that begins with {@code library}) is used by designs, not checked on its own.
 */
final class DesignFiles {
	static final String EXTENSION = ".bulwark";

	private DesignFiles() {
	}

	/** Files in the order given, each folder's designs sorted by path. Paths that do not exist stay in the
	 *  list so that the check reports them as unreadable. */
	static List<Path> collect(List<Path> paths) {
		List<Path> files = new ArrayList<>();
		for (Path p : paths) {
			if (Files.isDirectory(p)) {
				try (Stream<Path> walk = Files.walk(p)) {
					files.addAll(walk.filter(f -> f.getFileName().toString().endsWith(EXTENSION))
							.filter(Files::isRegularFile).filter(f -> !isLibrary(f)).sorted().collect(Collectors.toList()));
				} catch (IOException e) {
					throw new UncheckedIOException(e);
				}
			} else {
				files.add(p);
			}
		}
		return files;
	}

	/** Whether the file's first word, after comments and blank lines, is "library". */
	static boolean isLibrary(Path file) {
		try (var lines = Files.lines(file)) {
			return lines.map(String::strip).filter(l -> !l.isEmpty() && !l.startsWith("#")).findFirst()
					.map(l -> l.startsWith("library ") || l.startsWith("library\"")).orElse(false);
		} catch (IOException | UncheckedIOException e) {
			return false; // unreadable: the check reports it
		}
	}
}
