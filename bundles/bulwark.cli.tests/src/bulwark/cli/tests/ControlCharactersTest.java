package bulwark.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A title or file name holding control characters — an escape sequence that retitles a terminal, a bell —
 * never reaches the terminal raw, and every XML output stays well-formed.
 */
class ControlCharactersTest {
	private static final String ESCAPE = "\u001b]0;owned\u0007";

	private static Path design(Path dir) throws Exception {
		Path file = dir.resolve("in" + ESCAPE + ".bulwark");
		Files.writeString(file, "design \"t" + ESCAPE + "\"\nreference net gnd\nnet a\n"
				+ "source V1 (plus: a, minus: gnd) { voltage 5 V }\nresistor R1 (a: a, b: gnd) { value 1 kΩ }\n");
		return file;
	}

	private static boolean raw(String text) {
		return text.chars().anyMatch(c -> c == 0x1b || c == 0x07);
	}

	@Test
	void theTextOutputShowsThemInsteadOfSendingThem(@TempDir Path dir) throws Exception {
		CliRun run = CliRun.of("check", design(dir).toString());
		assertEquals(0, run.exitCode(), run.err());
		assertTrue(!raw(run.out()) && !raw(run.err()), run.out());
		assertTrue(run.out().contains("in\\u001B]0;owned\\u0007.bulwark:5:10: warning rating-missing"), run.out());
	}

	@Test
	void theJUnitXmlStaysWellFormed(@TempDir Path dir) throws Exception {
		CliRun run = CliRun.of("check", "--format", "junit", design(dir).toString());
		var xml = DocumentBuilderFactory.newInstance().newDocumentBuilder()
				.parse(new ByteArrayInputStream(run.out().getBytes(StandardCharsets.UTF_8)));
		assertTrue(xml.getElementsByTagName("testsuite").getLength() == 1);
		for (String format : new String[] { "html", "sarif", "json" }) {
			assertTrue(!raw(CliRun.of("check", "--format", format, design(dir).toString()).out()), format);
		}
	}
}
