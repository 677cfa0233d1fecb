package bulwark.ui.start;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/** The demo designs shipped in the installation's examples folder, each with the title it declares. */
public final class DemoDesigns {
	public record Demo(String title, Path file) {
	}

	private static final Pattern TITLE = Pattern.compile("^design\\s+\"([^\"]*)\"", Pattern.MULTILINE);

	private DemoDesigns() {
	}

	public static Path folder() {
		return bulwark.ui.BulwarkUi.installation().examples();
	}

	/** The demos in file-name order; none when the folder is missing. */
	public static List<Demo> list() {
		if (!Files.isDirectory(folder())) {
			return List.of();
		}
		try (Stream<Path> files = Files.list(folder())) {
			return files.filter(f -> f.getFileName().toString().endsWith(".bulwark")).sorted()
					.map(f -> new Demo(title(f), f)).toList();
		} catch (IOException e) {
			return List.of();
		}
	}

	private static String title(Path file) {
		try {
			Matcher m = TITLE.matcher(Files.readString(file));
			return m.find() ? m.group(1) : file.getFileName().toString();
		} catch (IOException e) {
			return file.getFileName().toString();
		}
	}
}
