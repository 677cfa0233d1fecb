package bulwark.ui.start;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;

/**
 * The designs File > New starts from. Each is a complete design that passes the default review policy, so
 * that the first findings a designer sees are about their own changes (a UI test keeps them passing).
 */
public final class Templates {
	/** One template: its name in the dialog, what it is, and its file beside this class. */
	public record Template(String name, String description, String file) {
		public String text() {
			try (InputStream in = Templates.class.getResourceAsStream("templates/" + file)) {
				if (in == null) {
					throw new IllegalStateException("template missing from the installation: " + file);
				}
				return new String(in.readAllBytes(), StandardCharsets.UTF_8);
			} catch (IOException e) {
				throw new UncheckedIOException(e);
			}
		}
	}

	public static final List<Template> ALL = List.of(
			new Template("Blank design", "Two terminals and one rated part: the smallest design that checks.",
					"blank.bulwark"),
			new Template("Battery continuity tester",
					"A cell, an LED and a resettable protector; survives mains on the probes either way round.",
					"battery-continuity-tester.bulwark"),
			new Template("Field wiring logic input",
					"A resistor string, a divider and clamp diodes into a 5 V logic pin; survives mains.",
					"field-logic-input.bulwark"));

	private Templates() {
	}
}
