package bulwark.robustness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import bulwark.cli.BulwarkCommand;

/**
 * The cases of the fault-injection review, each a fixture (in {@code fixtures/}, or made here where it cannot
 * be a file in the repository: a flood, a named pipe, a link to a device) run through the command line as a
 * user runs it. Each states what broke before: a false pass, a crash that took a batch down, an output that
 * was not valid. The language server's malformed messages are sent by {@code MalformedMessagesTest}.
 */
class HostileInputTest {
	private static final Path FIXTURES = Path.of(System.getProperty("bulwark.robustness.fixtures", "fixtures"));
	private static final Path ROOT = Path.of(System.getProperty("bulwark.root", "../.."));
	/** A guard against a hang, not a measure of speed: each of these takes well under a second. */
	private static final Duration NO_HANG = Duration.ofSeconds(60);

	private record Run(int exit, String out, String err) {
		JsonArray designs() {
			return JsonParser.parseString(out).getAsJsonObject().getAsJsonArray("designs");
		}

		JsonObject design() {
			assertEquals(1, designs().size(), out);
			return designs().get(0).getAsJsonObject();
		}
	}

	private static Run bulwark(String... args) {
		return assertTimeoutPreemptively(NO_HANG, () -> {
			StringWriter out = new StringWriter(), err = new StringWriter();
			int code = BulwarkCommand.run(args, new PrintWriter(out), new PrintWriter(err));
			return new Run(code, out.toString(), err.toString());
		});
	}

	private static List<JsonObject> findings(JsonObject design) {
		List<JsonObject> list = new ArrayList<>();
		for (JsonElement e : design.getAsJsonArray("findings")) {
			list.add(e.getAsJsonObject());
		}
		return list;
	}

	private static JsonObject finding(JsonObject design, String messagePart) {
		return findings(design).stream().filter(f -> f.get("message").getAsString().contains(messagePart)).findFirst()
				.orElseThrow(() -> new AssertionError("no finding with '" + messagePart + "' in " + design.get("findings")));
	}

	/** 1. A library's power rating written in kV was taken as 5,000 W: the design passed. */
	@Test
	void aLibraryWithAnErrorStopsTheCheckAtItsUse() {
		Run r = bulwark("check", "--format", "json", FIXTURES.resolve("library-power-as-voltage/design.bulwark").toString());
		assertEquals(2, r.exit(), r.err());
		assertEquals("error", r.design().get("status").getAsString());
		JsonObject f = finding(r.design(), "the library 'parts.bulwark' has an error at 2:");
		assertEquals(4, f.get("line").getAsInt(), "at the use line");
	}

	/** 2. With its power rating deleted, an 0805 resistor at 0.96 W only warned, and the design passed. */
	@Test
	void aDeletedRatingIsJudgedByItsPackage() {
		Run r = bulwark("check", "--format", "json", FIXTURES.resolve("deleted-rating.bulwark").toString());
		assertEquals(1, r.exit(), r.out());
		JsonObject f = findings(r.design()).stream().filter(x -> x.get("rule").getAsString().equals("resistor-power"))
				.findFirst().orElseThrow(() -> new AssertionError(r.out()));
		// 24²/600 Ω = 0.96 W against the 0805 package's usual 125 mW derated to 60 % [closed form]
		assertEquals(0.96, f.get("value").getAsDouble(), 1e-9);
		assertEquals(0.125 * 0.6, f.get("limit").getAsDouble(), 1e-12);
	}

	/** 2. A part with nothing to judge it by leaves the design "pass with unchecked parts", never a pass. */
	@Test
	void aPartWithoutRatingsIsNeverAPlainPass() {
		Run r = bulwark("check", "--format", "json", FIXTURES.resolve("unchecked-part.bulwark").toString());
		assertEquals("pass-unchecked", r.design().get("status").getAsString(), r.out());
	}

	/** 3. 400 KB of '[' lines: one finding per character, and the heap ran out. */
	@Test
	void aFloodOfBracketsEndsInAHundredFindingsAtMost(@TempDir Path dir) throws IOException {
		Path flood = Files.writeString(dir.resolve("flood.bulwark"), "design \"flood\"\n" + "[\n".repeat(200_000));
		Run r = bulwark("check", "--format", "json", flood.toString());
		assertEquals(2, r.exit(), r.err());
		List<JsonObject> findings = findings(r.design());
		assertTrue(findings.size() <= 100, findings.size() + " findings");
		assertTrue(findings.stream().allMatch(f -> f.get("line").getAsInt() > 0), "every finding located");
	}

	/** 4. A file the check refused for its size was read and parsed again for quick fixes: 472 s, then no memory. */
	@Test
	void aFileOverTheSizeLimitIsRefusedAndNeverReadAgain(@TempDir Path dir) throws IOException {
		Path big = Files.writeString(dir.resolve("big.bulwark"), "design \"big\"\n" + "#".repeat(5_000_000));
		Run r = bulwark("check", "--format", "json", big.toString());
		assertEquals(2, r.exit(), r.err());
		assertEquals("error", r.design().get("status").getAsString());
	}

	/** 5. Many terminals: thousands of mains cases, every one kept, and the heap ran out. */
	@Test
	void aDesignWithManyTerminalsIsChecked(@TempDir Path dir) throws IOException {
		StringBuilder s = new StringBuilder("design \"Forty inputs\"\nreference net gnd\nterminal G \"ground\" at gnd common\n");
		for (int i = 1; i < 40; i++) {
			s.append("net n").append(i).append("\nterminal T").append(i).append(" \"in ").append(i).append("\" at n").append(i)
					.append("\nresistor R").append(i).append(" (a: n").append(i).append(", b: gnd) { value 100 kΩ ± 1 % ")
					.append("rated power 250 mW rated voltage 200 V package 1206 }\n");
		}
		Run r = bulwark("check", "--format", "json", "--no-fixes", Files.writeString(dir.resolve("forty.bulwark"), s).toString());
		assertEquals(1, r.exit(), r.err());
		JsonObject d = r.design();
		assertEquals("fail", d.get("status").getAsString());
		// 780 pairs of 40 terminals, two mains systems, each with its whole cycle and its instants
		assertTrue(d.getAsJsonArray("cases").size() > 780 * 2, d.getAsJsonArray("cases").size() + " cases");
		assertEquals(24, d.getAsJsonArray("waveforms").size(), "the 24 most stressing cycles are plotted");
	}

	/** 6 and 7. A model file as a library aborted every command, and one broken design emptied the batch. */
	@Test
	void aModelFileAsALibraryIsALocatedErrorAndTheBatchGoesOn(@TempDir Path dir) throws IOException {
		Files.copy(FIXTURES.resolve("use-xmi/design.bulwark"), dir.resolve("a-uses-xmi.bulwark"));
		Files.copy(FIXTURES.resolve("use-xmi/x.xmi"), dir.resolve("x.xmi"));
		Files.copy(FIXTURES.resolve("deleted-rating.bulwark"), dir.resolve("b-checked.bulwark"));
		Files.writeString(dir.resolve("c-flood.bulwark"), "[\n".repeat(50_000));
		Run r = bulwark("check", "--format", "json", "--no-fixes", dir.toString());
		JsonArray designs = r.designs();
		assertEquals(3, designs.size(), r.out());
		JsonObject xmi = designs.get(0).getAsJsonObject();
		assertEquals("error", xmi.get("status").getAsString());
		assertEquals(2, findings(xmi).get(0).get("line").getAsInt(), xmi.toString());
		assertEquals("fail", designs.get(1).getAsJsonObject().get("status").getAsString(), "the others are checked");
		assertEquals("error", designs.get(2).getAsJsonObject().get("status").getAsString());
	}

	/** 8. A named pipe as a design hung for ever; a link to /dev/zero ran out of memory. */
	@Test
	void specialFilesAreRefusedAtOnce(@TempDir Path dir) throws Exception {
		Path fifo = dir.resolve("pipe.bulwark");
		Process mkfifo = new ProcessBuilder("mkfifo", fifo.toString()).inheritIO().start();
		assertEquals(0, mkfifo.waitFor());
		Path zero = Files.createSymbolicLink(dir.resolve("zero.bulwark"), Path.of("/dev/zero"));
		for (Path special : List.of(fifo, zero)) {
			Run r = bulwark("check", "--format", "json", special.toString());
			assertEquals(2, r.exit(), special + ": " + r.err());
			assertEquals("error", r.design().get("status").getAsString());
		}
	}

	/** 9 and 10. Titles that a spreadsheet runs as formulas, and file names whose pages overwrote each other. */
	@Test
	void theClassSummaryIsDefusedAndEveryDesignHasItsOwnPage(@TempDir Path dir) throws IOException {
		Path students = Files.createDirectories(dir.resolve("class"));
		String design = Files.readString(FIXTURES.resolve("deleted-rating.bulwark"));
		String[] titles = { "=1+2\u2028", "\tHYPERLINK", "@SUM(A1)" };
		String[] names = { "a b.bulwark", "a_b.bulwark", "summary.bulwark" };
		for (int i = 0; i < names.length; i++) {
			Files.writeString(students.resolve(names[i]), design.replace("\"Deleted power rating\"", "\"" + titles[i] + "\""));
		}
		Path out = dir.resolve("feedback");
		Run r = bulwark("classroom", "--policy", ROOT.resolve("examples/teaching-lab.bulwark-policy").toString(), "--out",
				out.toString(), students.toString());
		assertEquals(0, r.exit(), r.err());
		try (var pages = Files.list(out)) {
			assertEquals(5, pages.count(), "three pages, summary.html and summary.csv");
		}
		String csv = Files.readString(out.resolve("summary.csv"), StandardCharsets.UTF_8);
		// every field quoted ("" inside for a quote), separated by commas, records by line ends
		java.util.regex.Matcher field = java.util.regex.Pattern.compile("\"((?:[^\"]|\"\")*)\"(,|\r?\n|$)").matcher(csv);
		int at = 0, fields = 0;
		while (at < csv.length()) {
			assertTrue(field.find(at) && field.start() == at, "not a quoted field at " + at + ": " + csv.substring(at));
			assertFalse(field.group(1).matches("(?s)[=+\\-@\t\r].*"), "not defused: " + field.group(1));
			at = field.end();
			fields++;
		}
		assertTrue(fields > 3 * 3, csv);
	}

	/** 11. An escape sequence in a title reached the terminal raw, and made the JUnit XML ill-formed. */
	@Test
	void controlCharactersNeverReachTheTerminalAndTheXmlStaysWellFormed() throws Exception {
		String file = FIXTURES.resolve("control-characters.bulwark").toString();
		Run text = bulwark("check", file);
		assertFalse((text.out() + text.err()).contains("\u001b"), text.out());
		Run junit = bulwark("check", "--format", "junit", file);
		DocumentBuilderFactory.newInstance().newDocumentBuilder()
				.parse(new ByteArrayInputStream(junit.out().getBytes(StandardCharsets.UTF_8)));
	}

	/** 12. Saving a report over a link replaced the link with a file, and reset its mode to 0600. */
	@Test
	void aReportSavedThroughALinkKeepsTheLinkAndTheMode(@TempDir Path dir) throws IOException {
		Path real = Files.writeString(dir.resolve("real.json"), "old");
		Files.setPosixFilePermissions(real, PosixFilePermissions.fromString("rw-rw-r--"));
		Path link = Files.createSymbolicLink(dir.resolve("report.json"), real);
		bulwark("check", "--format", "json", "--no-fixes", "--out", link.toString(),
				FIXTURES.resolve("deleted-rating.bulwark").toString());
		assertTrue(Files.isSymbolicLink(link));
		assertEquals("rw-rw-r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(real, LinkOption.NOFOLLOW_LINKS)));
		assertTrue(Files.readString(real).contains("\"designs\""));
	}

	/** A file saved in Latin-1 was refused with no hint of where; now at its first byte that is not UTF-8. */
	@Test
	void aFileNotInUtf8IsRefusedAtItsFirstWrongByte(@TempDir Path dir) throws IOException {
		byte[] latin1 = "design \"x\"\nreference net gnd\nnet a\n# caf\u00e9\n".getBytes(StandardCharsets.ISO_8859_1);
		Path file = Files.write(dir.resolve("latin.bulwark"), latin1);
		Run r = bulwark("check", "--format", "json", file.toString());
		assertEquals(2, r.exit(), r.err());
		JsonObject f = finding(r.design(), "is not UTF-8 text: byte 0xE9 at line 4, column 6");
		assertEquals(4, f.get("line").getAsInt());
		assertEquals(6, f.get("column").getAsInt());
	}

	/** 13. A number of 401 digits became an unlocated fault of Bulwark's own. */
	@Test
	void aNumberTooLargeIsALocatedError() {
		Run r = bulwark("check", "--format", "json", FIXTURES.resolve("huge-number.bulwark").toString());
		assertEquals(2, r.exit(), r.err());
		JsonObject f = finding(r.design(), "too large to compute with");
		assertEquals(9, f.get("line").getAsInt());
	}
}
