package bulwark.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** explain, --fail-on, --jobs and the JUnit XML report. */
class ReportsAndOptionsTest {
	private static final String LAB = "lab-indicator-seeded.bulwark";

	@Test
	void explainRendersTheRulePage() {
		CliRun run = CliRun.of("explain", "resistor-power");
		assertEquals(0, run.exitCode(), run.err());
		assertTrue(run.out().startsWith("RESISTOR-POWER — A RESISTOR DISSIPATES MORE THAN ITS DERATED POWER RATING\n"),
				run.out());
		assertTrue(run.out().contains("\nHow it is computed\n------------------\n"), run.out());
		CliRun unknown = CliRun.of("explain", "no-such-rule");
		assertEquals(3, unknown.exitCode());
		assertTrue(unknown.err().contains("resistor-power"), unknown.err());
	}

	@Test
	void failOnDecidesWhatFails(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
		java.nio.file.Path unrated = dir.resolve("unrated.bulwark");
		java.nio.file.Files.writeString(unrated, "design \"unrated\"\nreference net gnd\nnet a\n"
				+ "source V1 (plus: a, minus: gnd) { voltage 5 V }\nresistor R1 (a: a, b: gnd) { value 1 kΩ rated voltage 150 V }\n");
		assertEquals(0, CliRun.of("check", unrated.toString()).exitCode()); // a warning only
		assertEquals(1, CliRun.of("check", "--fail-on", "warning", unrated.toString()).exitCode());
		assertEquals(0, CliRun.of("check", "--fail-on", "never", CliRun.example(LAB)).exitCode());
	}

	@Test
	void shardsSplitTheDesignsOnce() {
		String folder = CliRun.root().resolve("examples").toString();
		java.util.List<String> all = checkedFiles("check", "--fail-on", "never", "--format", "json", folder);
		assertEquals(6, all.size(), all::toString);
		java.util.List<String> fromShards = new java.util.ArrayList<>();
		for (int k = 1; k <= 3; k++) {
			java.util.List<String> share = checkedFiles("check", "--fail-on", "never", "--format", "json", "--shard",
					k + "/3", folder);
			assertEquals(2, share.size(), "shard " + k + "/3 of 6 holds 2: " + share);
			fromShards.addAll(share);
		}
		// every design in exactly one shard, none twice, none lost
		assertEquals(new java.util.TreeSet<>(all), new java.util.TreeSet<>(fromShards));
		assertEquals(all.size(), fromShards.size(), fromShards::toString);
		assertEquals(3, CliRun.of("check", "--shard", "4/3", folder).exitCode());
	}

	/** The design files a JSON report lists, in report order. */
	private static java.util.List<String> checkedFiles(String... args) {
		CliRun run = CliRun.of(args);
		java.util.List<String> files = new java.util.ArrayList<>();
		java.util.regex.Matcher m = java.util.regex.Pattern.compile("\"file\": \"([^\"]+)\"").matcher(run.out());
		while (m.find()) {
			files.add(m.group(1));
		}
		return files;
	}

	@Test
	void parallelChecksReportInFileOrder() {
		String folder = CliRun.root().resolve("examples").toString();
		CliRun one = CliRun.of("check", "--jobs", "1", folder);
		CliRun four = CliRun.of("check", "--jobs", "4", folder);
		assertEquals(one.out(), four.out());
		assertEquals(one.exitCode(), four.exitCode());
	}

	@Test
	void htmlReportIsSelfContainedAndEscaped(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
		java.nio.file.Path hostile = dir.resolve("hostile.bulwark");
		java.nio.file.Files.copy(CliRun.root().resolve("examples/teaching-lab.bulwark-policy"),
				dir.resolve("teaching-lab.bulwark-policy"));
		java.nio.file.Files.writeString(hostile, java.nio.file.Files.readString(CliRun.root().resolve("examples").resolve(LAB))
				.replace("design \"Lab:", "design \"<script>alert(1)</script> Lab:"));
		CliRun run = CliRun.of("check", "--format", "html", hostile.toString());
		assertEquals(1, run.exitCode(), run.err());
		String html = run.out();
		assertTrue(html.startsWith("<!DOCTYPE html>"), html);
		assertTrue(html.contains("&lt;script&gt;alert(1)&lt;/script&gt; Lab:"), "title escaped");
		assertTrue(!html.contains("<script"), "nothing from the design runs");
		assertTrue(html.contains("IEC 61010-1"), "the safety caution");
		assertTrue(html.contains("<svg") && html.contains(">R_DROP</text>"), "a utilisation bar for R_DROP");
		assertTrue(html.contains("12.8× (power, normal, LAMP_OUT shorted to LAMP_RET)"), html);
		assertTrue(!html.contains("http"), "nothing fetched from anywhere");
	}

	/** Several designs: an index first, each design with its summary line; every bar's figure fits its picture. */
	@Test
	void htmlOfSeveralDesignsHasAnIndexAndUncutBars() {
		CliRun run = CliRun.of("check", "--format", "html", CliRun.root().resolve("examples").toString());
		String html = run.out();
		int index = html.indexOf("<th>design</th><th>status</th><th>summary</th>");
		assertTrue(index > 0 && index < html.indexOf("<h2 id=\"design-1\">"), "the index comes first");
		for (int i = 1; i <= 6; i++) {
			assertTrue(html.contains("href=\"#design-" + i + "\"") && html.contains("<h2 id=\"design-" + i + "\">"), "design " + i);
		}
		assertTrue(html.contains("error(s), ") && html.contains("; most used: R_DROP at 1280 % of its power limit"), html);
		// each bar picture is wider than its longest figure needs at 7 px a character
		java.util.regex.Matcher svg = java.util.regex.Pattern.compile("<svg width=\"(\\d+)\"[^>]*font-size=\"12\">(.*?)</svg>",
				java.util.regex.Pattern.DOTALL).matcher(html);
		int pictures = 0;
		while (svg.find()) {
			java.util.regex.Matcher text = java.util.regex.Pattern.compile("<text x=\"(\\d+)\" y=\"\\d+\">([^<]*)</text>")
					.matcher(svg.group(2));
			while (text.find()) {
				int end = Integer.parseInt(text.group(1)) + 7 * text.group(2).length();
				assertTrue(end <= Integer.parseInt(svg.group(1)), "cut: " + text.group(2) + " ends at " + end + " of " + svg.group(1));
			}
			pictures++;
		}
		assertTrue(pictures > 0);
	}

	/** A passive input pushes nothing into a short: read as ≈ 0 with the resolution, not as picoamperes of noise. */
	@Test
	void solverNoiseReadsAsNothing(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
		java.nio.file.Path passive = java.nio.file.Files.writeString(dir.resolve("passive.bulwark"), """
				design "passive"
				reference net gnd
				net tip
				terminal TIP at tip
				terminal COM at gnd common
				resistor R1 (a: tip, b: gnd) { value 10 kΩ rated power 250 mW rated voltage 500 V }
				""");
		String html = CliRun.of("check", "--format", "html", passive.toString()).out();
		assertTrue(html.contains("<td>≈ 0 (below 1 nA)</td>"), html);
	}

	@Test
	void htmlShowsThePolicyTheFunctionAndTheSweep() {
		CliRun run = CliRun.of("check", "--format", "html", CliRun.example("marina-bilge-switch-tester.bulwark"));
		String html = run.out();
		assertTrue(html.contains("review policy 'Marine DC systems'"), html);
		assertTrue(html.contains("<h3>Function at the terminals</h3>"), html);
		assertTrue(html.contains("<title>threshold sweep TIP–CLIP</title>") && html.contains("rising 154 kΩ"), html);
		assertTrue(!html.contains("<script") && !html.contains("http"), "self-contained");
	}

	@Test
	void junitReportHasOneCasePerRuleAndDesign() throws Exception {
		CliRun run = CliRun.of("check", "--format", "junit", CliRun.example(LAB), CliRun.example("greenhouse-vent-input.bulwark"));
		assertEquals(1, run.exitCode(), run.err());
		Document xml = DocumentBuilderFactory.newInstance().newDocumentBuilder()
				.parse(new ByteArrayInputStream(run.out().getBytes(StandardCharsets.UTF_8)));
		NodeList suites = xml.getElementsByTagName("testsuite");
		assertEquals(2, suites.getLength());
		NodeList failures = xml.getElementsByTagName("failure");
		assertEquals(1, failures.getLength());
		Element failed = (Element) failures.item(0).getParentNode();
		assertEquals("resistor-power", failed.getAttribute("name"));
		assertTrue(failed.getAttribute("classname").endsWith(LAB));
		assertEquals(0, xml.getElementsByTagName("error").getLength());
		// the counts CI pages read off the elements: one failing case among each design's
		Element lab = (Element) suites.item(0), all = (Element) xml.getElementsByTagName("testsuites").item(0);
		int perDesign = lab.getElementsByTagName("testcase").getLength();
		assertEquals(Integer.toString(perDesign), lab.getAttribute("tests"));
		assertEquals("1", lab.getAttribute("failures"));
		assertEquals("0", lab.getAttribute("errors"));
		assertEquals(Integer.toString(2 * perDesign), all.getAttribute("tests"));
		assertEquals("1", all.getAttribute("failures"));
	}

	/** A design below the folder Bulwark runs in is named by its path from there, not from the root. */
	@Test
	void junitNamesDesignsByTheirRelativePath() throws Exception {
		String absolute = java.nio.file.Path.of("").toAbsolutePath().resolve("x/lab.bulwark").toString();
		assertEquals("x/lab.bulwark", bulwark.check.report.JUnitReport.shown(absolute));
		assertEquals("/elsewhere/lab.bulwark", bulwark.check.report.JUnitReport.shown("/elsewhere/lab.bulwark"));
	}
}
