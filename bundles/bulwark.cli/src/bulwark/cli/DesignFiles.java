package bulwark.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/** Expands the paths given on the command line: files as given, folders searched for design files. */
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
							.filter(Files::isRegularFile).sorted().collect(Collectors.toList()));
				} catch (IOException e) {
					throw new UncheckedIOException(e);
				}
			} else {
				files.add(p);
			}
		}
		return files;
	}
}
