package bulwark.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `bulwark classroom DIR --policy FILE --out DIR`: a page per student, a summary, the class folder untouched. */
class ClassroomCommandTest {
	private static final String GOOD = """
			design "=SUM(A1), \\"divider\\""
			reference net gnd
			net a
			source V1 (plus: a, minus: gnd) { voltage 5 V }
			resistor R1 (a: a, b: gnd) { value 1 kΩ package 0805 rated power 125 mW }
			""";

	private static Path classFolder(Path dir) throws Exception {
		Path students = Files.createDirectories(dir.resolve("class/group-b"));
		Files.writeString(dir.resolve("class/ana.bulwark"), GOOD);
		Files.writeString(dir.resolve("class/ben.bulwark"), GOOD.replace("1 kΩ", "100 Ω")); // 250 mW in 125 mW
		Files.writeString(dir.resolve("class/cho.bulwark"), "design \"cho\"\nreference net gnd\nresistor R1 (a gnd) { }\n");
		Files.writeString(students.resolve("dev.bulwark"), GOOD);
		Files.writeString(dir.resolve("exercise.bulwark-policy"), "policy \"exercise 3\"\n  mains none\n");
		return dir.resolve("class");
	}

	@Test
	void aPagePerDesignAndAClassSummary(@TempDir Path dir) throws Exception {
		Path students = classFolder(dir);
		Path out = dir.resolve("feedback");
		CliRun run = CliRun.of("classroom", students.toString(), "--policy", dir.resolve("exercise.bulwark-policy").toString(),
				"--out", out.toString());
		assertEquals(0, run.exitCode(), run.err());
		try (var pages = Files.list(out)) {
			assertEquals(List.of("ana.html", "ben.html", "cho.html", "group-b__dev.html", "summary.csv", "summary.html"),
					pages.map(p -> p.getFileName().toString()).sorted().toList());
		}
		// the submission that does not parse still gets its page, with the error located
		String cho = Files.readString(out.resolve("cho.html"));
		assertTrue(cho.contains("<td>3:16</td><td>error</td><td>syntax</td>"), cho);
		// a page names the design from the class's folder, never where the teacher keeps it, and is titled by it
		String dev = Files.readString(out.resolve("group-b__dev.html"));
		assertTrue(!dev.contains(dir.toString()), "an absolute path on a student's page: " + dev);
		assertTrue(dev.contains("group-b/dev.bulwark") || dev.contains("group-b\\dev.bulwark"), dev);
		String ana = Files.readString(out.resolve("ana.html"));
		assertTrue(ana.contains("<title>=SUM(A1), &quot;divider&quot; — feedback</title>"), ana);
		List<String> csv = Files.readAllLines(out.resolve("summary.csv"));
		assertEquals(6, csv.size());
		assertTrue(csv.get(5).contains("IEC 61010-1"), "the caution, last: " + csv.get(5));
		assertTrue(csv.get(1).startsWith("\"ana.bulwark\",\"'=SUM(A1), \"\"divider\"\"\",\"pass\",\"0\","), csv.get(1));
		assertTrue(csv.get(2).startsWith("\"ben.bulwark\",") && csv.get(2).contains(",\"fail\",\"1\","), csv.get(2));
		assertTrue(csv.get(3).contains(",\"error\","), csv.get(3));
		String summary = Files.readString(out.resolve("summary.html"));
		assertTrue(summary.contains("<a href=\"group-b__dev.html\">") && summary.contains("exercise 3")
				&& summary.contains("IEC 61010-1"), summary);
		try (var left = Files.walk(students)) {
			assertEquals(6, left.count(), "nothing written in the class's folder"); // 2 folders, 4 designs
		}
	}

	@Test
	void everyDesignGetsItsOwnPageAndNoFieldIsAFormula(@TempDir Path dir) throws Exception {
		Path students = Files.createDirectories(dir.resolve("class/group-a"));
		Files.writeString(students.resolve("kim.bulwark"), GOOD);
		Files.writeString(dir.resolve("class/group-a__kim.bulwark"), GOOD);
		Files.writeString(dir.resolve("class/a b.bulwark"), GOOD.replace("=SUM(A1), \\\"divider\\\"", "=cmd\u2028"));
		Files.writeString(dir.resolve("class/a_b.bulwark"), GOOD.replace("=SUM(A1), \\\"divider\\\"", "\t=1+1"));
		Files.writeString(dir.resolve("class/summary.bulwark"), GOOD);
		Files.writeString(dir.resolve("class/+x\n=y.bulwark"), GOOD);
		Files.writeString(dir.resolve("exercise.bulwark-policy"), "policy \"exercise 3\"\n  mains none\n");
		Path out = dir.resolve("feedback");
		CliRun run = CliRun.of("classroom", dir.resolve("class").toString(), "--policy",
				dir.resolve("exercise.bulwark-policy").toString(), "--out", out.toString());
		assertEquals(0, run.exitCode(), run.err());
		try (var pages = Files.list(out)) {
			// six designs, six pages, and the summary's own two files untouched by a design called "summary"
			assertEquals(8, pages.count());
		}
		String summary = Files.readString(out.resolve("summary.html"));
		assertTrue(summary.contains("summary-2.html") && summary.contains("group-a__kim-2.html")
				&& summary.contains("a_b-2.html"), summary);
		assertTrue(Files.readString(out.resolve("summary-2.html")).contains("=SUM(A1)"), "the design's own page");
		String csv = Files.readString(out.resolve("summary.csv"));
		// every field quoted; every field that starts with = + - @ tab or CR defused, whatever follows
		for (String row : csv.split("\n(?=\")")) {
			for (String field : row.split(",(?=\")")) {
				assertTrue(field.startsWith("\""), "unquoted field " + field);
				assertFalse(field.length() > 1 && "=+-@\t\r".indexOf(field.charAt(1)) >= 0, "formula " + field);
			}
		}
		assertTrue(csv.contains("\"'=cmd\u2028\"") && csv.contains("\"'\t=1+1\"") && csv.contains("\"'+x\n=y.bulwark\""), csv);
	}

	@Test
	void refusesToWriteInsideTheClassFolder(@TempDir Path dir) throws Exception {
		Path students = classFolder(dir);
		CliRun run = CliRun.of("classroom", students.toString(), "--policy", dir.resolve("exercise.bulwark-policy").toString(),
				"--out", students.resolve("feedback").toString());
		assertEquals(3, run.exitCode());
		assertTrue(run.err().contains("outside the class's folder"), run.err());
		assertFalse(Files.exists(students.resolve("feedback")));
	}
}
