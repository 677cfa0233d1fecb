package bulwark.lang.install;

import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Where this Bulwark is installed (its documents and demo designs) and the library folders designs may
 * {@code use} files from. Read once where a program starts — the command line, the workbench, the language
 * server — and handed to what needs it; nothing below reads system properties or the environment.
 *
 * @param home           the installation folder: docs/ and examples/ are in it
 * @param libraryFolders folders searched, in order, for a {@code use}d file not beside the design
 */
public record Installation(Path home, List<Path> libraryFolders) {
	/** The launcher's system property naming the installation folder. */
	public static final String HOME_PROPERTY = "bulwark.home";
	/** The launcher's system property listing library folders, separated as the platform separates paths. */
	public static final String LIBRARY_PROPERTY = "bulwark.library";
	/** The environment variable listing library folders, searched after the property's. */
	public static final String LIBRARY_ENVIRONMENT = "BULWARK_LIBRARY";

	public Installation {
		home = home.toAbsolutePath().normalize();
		libraryFolders = libraryFolders.stream().map(p -> p.toAbsolutePath().normalize()).distinct().toList();
	}

	/** The installation as the launcher describes it; the working folder when it names none. */
	public static Installation fromLaunch() {
		List<Path> folders = new ArrayList<>();
		folders.addAll(split(System.getProperty(LIBRARY_PROPERTY)));
		folders.addAll(split(System.getenv(LIBRARY_ENVIRONMENT)));
		return new Installation(Path.of(System.getProperty(HOME_PROPERTY, ".")), folders);
	}

	/** The same installation with these folders searched first (a run's --library). */
	public Installation withLibraryFoldersFirst(List<Path> first) {
		List<Path> all = new ArrayList<>(first);
		all.addAll(libraryFolders);
		return new Installation(home, all);
	}

	/** A page of the documentation, by its name without extension ("user-guide"). */
	public Path guidePage(String page) {
		return home.resolve("docs").resolve(page + ".md");
	}

	/** A rule's explanation page, docs/rules/ID.md. */
	public Path rulePage(String ruleId) {
		return home.resolve("docs").resolve("rules").resolve(ruleId + ".md");
	}

	/** The folder of the demo designs. */
	public Path examples() {
		return home.resolve("examples");
	}

	private static List<Path> split(String folders) {
		List<Path> paths = new ArrayList<>();
		if (folders != null) {
			for (String f : folders.split(File.pathSeparator)) {
				if (!f.isBlank()) {
					paths.add(Path.of(f));
				}
			}
		}
		return paths;
	}
}
