package bulwark.cli;

import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import bulwark.lang.library.LibraryPath;

/** Sets the library path for this run: the --library folders, then those of BULWARK_LIBRARY. */
final class LibraryFolders {
	static final String ENVIRONMENT = "BULWARK_LIBRARY";

	private LibraryFolders() {
	}

	static void apply(List<Path> given) {
		List<String> folders = new ArrayList<>();
		given.forEach(p -> folders.add(p.toAbsolutePath().normalize().toString()));
		String env = System.getenv(ENVIRONMENT);
		if (env != null && !env.isBlank()) {
			folders.add(env);
		}
		if (!folders.isEmpty()) {
			System.setProperty(LibraryPath.PROPERTY, String.join(File.pathSeparator, folders));
		}
	}
}
