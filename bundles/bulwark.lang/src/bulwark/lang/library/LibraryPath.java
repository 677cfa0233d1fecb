package bulwark.lang.library;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eclipse.emf.common.notify.impl.AdapterImpl;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.util.EcoreUtil;

import bulwark.lang.install.Installation;

/**
 * Where a {@code use "…"} finds its file: relative to the file that says it, else in a folder of the library
 * path. Never outside those folders (see {@link Confinement}). The library path belongs to the resource set
 * the design is loaded into ({@link #attach}); a resource set without one (an editor's, the language
 * server's) searches the folders of {@link Installation#fromLaunch()}.
 */
public final class LibraryPath {
	/** Why a name finds no library. */
	public enum Refusal {
		/** No file of that name in any of the folders. */
		NOT_FOUND,
		/** The name is not a relative file name, or it leads out of the folders. */
		OUTSIDE,
		/** The file is there but cannot be a library: another kind of file, not a regular file, too large. */
		NOT_A_LIBRARY
	}

	/** The found file, or why there is none. */
	public record Located(Optional<Path> file, Refusal refusal, String problem) {
		static Located found(Path p) {
			return new Located(Optional.of(p), null, null);
		}

		static Located refused(Refusal refusal, String why) {
			return new Located(Optional.empty(), refusal, why);
		}
	}

	/** The library folders of one resource set. */
	private static final class Folders extends AdapterImpl {
		final List<Path> folders;

		Folders(List<Path> folders) {
			this.folders = List.copyOf(folders);
		}

		@Override
		public boolean isAdapterForType(Object type) {
			return type == Folders.class;
		}
	}

	/** The file name ending of designs and libraries. */
	public static final String EXTENSION = ".bulwark";
	/** Largest library file read, in bytes: as for a design, four million characters of four bytes. */
	static final long MAX_BYTES = 16_000_000L;

	private LibraryPath() {
	}

	/** Gives a resource set its library folders, searched in order after the design's own folder. */
	public static void attach(ResourceSet resources, List<Path> folders) {
		resources.eAdapters().removeIf(a -> a instanceof Folders);
		resources.eAdapters().add(new Folders(folders));
	}

	/** The library folders a resource is loaded with. */
	public static List<Path> folders(Resource context) {
		ResourceSet set = context == null ? null : context.getResourceSet();
		if (set != null && EcoreUtil.getAdapter(set.eAdapters(), Folders.class) instanceof Folders f) {
			return f.folders;
		}
		return Installation.fromLaunch().libraryFolders();
	}

	/** Locates what a resource names in a {@code use}. */
	public static Located locate(Resource context, String written) {
		if (written == null || written.isBlank()) {
			return Located.refused(Refusal.OUTSIDE, "name the library file, for example use \"lib/generic-parts.bulwark\"");
		}
		Path relative = Confinement.relativeName(written);
		if (relative == null) {
			return Located.refused(Refusal.OUTSIDE, written.contains(":") || written.startsWith("~") || looksAbsolute(written)
					? "'" + written + "' must be relative to the design's folder or the library path"
					: "'" + written + "' is not a file name");
		}
		if (!relative.getFileName().toString().endsWith(EXTENSION)) {
			return Located.refused(Refusal.NOT_A_LIBRARY, "'" + written + "' is not a parts library: a library is a Bulwark file whose name ends in "
					+ EXTENSION + " and whose first word is 'library'");
		}
		URI uri = context == null ? null : context.getURI();
		List<Path> roots = new ArrayList<>();
		if (uri != null && uri.isFile()) {
			Path own = Path.of(uri.toFileString()).toAbsolutePath().normalize().getParent();
			if (own != null) {
				roots.add(own);
			}
		}
		roots.addAll(folders(context));
		boolean escapes = false;
		for (Path root : roots) {
			Confinement.Place place = Confinement.within(root, relative);
			switch (place.verdict()) {
			case CLIMBS_OUT -> escapes = true;
			case LINKS_OUT, UNREADABLE -> {
				return Located.refused(Refusal.OUTSIDE, place.problem());
			}
			case INSIDE -> {
				if (Files.isRegularFile(place.file())) {
					return tooLarge(place.file()) ? Located.refused(Refusal.NOT_A_LIBRARY, "the library '" + written + "' is larger than "
							+ MAX_BYTES / 1_000_000 + " MB; a parts library is a few thousand lines") : Located.found(place.file());
				}
				if (Files.exists(place.file()) && !Files.isDirectory(place.file())) {
					return Located.refused(Refusal.NOT_A_LIBRARY, "'" + written + "' is not a regular file (a pipe, a device or a socket); "
							+ "a library must be a file");
				}
			}
			}
		}
		if (escapes) {
			return Located.refused(Refusal.OUTSIDE, "'" + written + "' leaves the design's folder; libraries stay in it or on the library path");
		}
		// the folders looked in, as a person writes them (the design's own, then the library path's)
		String where = roots.stream().map(String::valueOf).collect(java.util.stream.Collectors.joining(", "));
		return Located.refused(Refusal.NOT_FOUND, "no library file '" + written + "' in "
				+ (where.isEmpty() ? "any folder: the design has no folder and there is no library path" : where));
	}

	private static boolean tooLarge(Path file) {
		try {
			return Files.size(file) > MAX_BYTES;
		} catch (java.io.IOException e) {
			return false; // the loader says why it cannot read it
		}
	}

	private static boolean looksAbsolute(String written) {
		return written.startsWith("/") || written.startsWith("\\");
	}
}
