package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * Every figure's source is inside the project: code, tests and documents cite docs/sources.md by one of its
 * sections, and nothing cites a file outside the repository.
 */
class CitedSourcesTest {
	/** A citation from code: docs/sources.md, optionally with a section. */
	private static final Pattern FROM_CODE = Pattern.compile("(\\S*)sources\\.md(#([a-z0-9-]+))?");

	/** The shared folder beside the checkout, spelt in two parts so that this file does not cite it. */
	private static final String OUTSIDE = "shared" + "/docs";

	@Test
	void everyCitationNamesASectionOfTheProjectsSources() throws IOException {
		Path root = Fixtures.root();
		Set<String> sections = sections(Files.readString(root.resolve("docs/sources.md")));
		List<String> wrong = new ArrayList<>();
		int citations = 0;
		for (Path file : citingFiles(root)) {
			String[] lines = Files.readString(file).split("\n", -1);
			for (int i = 0; i < lines.length; i++) {
				String where = root.relativize(file) + ":" + (i + 1);
				if (lines[i].contains(OUTSIDE)) {
					wrong.add(where + " cites a file outside the repository");
				}
				Matcher m = FROM_CODE.matcher(lines[i]);
				while (m.find()) {
					citations++;
					String written = m.group(1).substring(Math.max(m.group(1).lastIndexOf('('), m.group(1).lastIndexOf('[')) + 1);
					String expected = expectedPrefix(root, file);
					if (!written.equals(expected)) {
						wrong.add(where + " cites '" + written + "sources.md', not '" + expected + "sources.md'");
					}
					if (m.group(3) != null && !sections.contains(m.group(3))) {
						wrong.add(where + " cites section #" + m.group(3) + ", which docs/sources.md lacks");
					}
				}
			}
		}
		assertEquals(List.of(), wrong);
		assertTrue(citations > 40, "the scan found only " + citations + " citations: is the root right?");
	}

	@Test
	void sectionsAreTheHeadingsAsLinked() {
		assertEquals(Set.of("labels", "solver-oracles", "mains-and-surges"),
				sections("# Title\n## Labels\ntext\n## Solver oracles\n## Mains and surges\n"));
	}

	/** The path a citation needs from this file: docs/ from code, ../ from docs/rules/, nothing from docs/. */
	private static String expectedPrefix(Path root, Path file) {
		Path docs = root.resolve("docs");
		if (!file.startsWith(docs)) {
			return "docs/";
		}
		Path relative = file.getParent().relativize(docs);
		return relative.toString().isEmpty() ? "" : relative.toString().replace('\\', '/') + "/";
	}

	/** The anchors of second-level headings, written as links write them. */
	static Set<String> sections(String markdown) {
		Set<String> anchors = new HashSet<>();
		for (String line : markdown.split("\n")) {
			if (line.startsWith("## ")) {
				anchors.add(line.substring(3).trim().toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9 -]", "")
						.replace(' ', '-'));
			}
		}
		return anchors;
	}

	private static List<Path> citingFiles(Path root) throws IOException {
		List<Path> files = new ArrayList<>();
		files.add(root.resolve("README.md"));
		try (Stream<Path> docs = Files.walk(root.resolve("docs"));
				Stream<Path> bundles = Files.walk(root.resolve("bundles"))) {
			docs.filter(p -> p.toString().endsWith(".md") && !p.endsWith("sources.md")).forEach(files::add);
			bundles.filter(p -> p.toString().contains("/src/") && p.toString().endsWith(".java"))
					.filter(p -> !p.toString().contains("/target/"))
					.filter(p -> !p.endsWith(CitedSourcesTest.class.getSimpleName() + ".java")) // names the page to read it
					.forEach(files::add);
		} catch (UncheckedIOException e) {
			throw e.getCause();
		}
		return files;
	}
}
