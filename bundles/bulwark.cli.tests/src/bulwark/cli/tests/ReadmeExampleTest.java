package bulwark.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The README's tiny design produces exactly the findings the README shows. */
class ReadmeExampleTest {
	private static final Pattern FENCE = Pattern.compile("```(\\w*)\\n(.*?)```", Pattern.DOTALL);

	@Test
	void readmeFindingsAreTrue(@TempDir Path dir) throws Exception {
		String readme = Files.readString(CliRun.root().resolve("README.md"));
		String design = null;
		String expected = null;
		Matcher m = FENCE.matcher(readme);
		while (m.find()) {
			if (m.group(1).equals("bulwark") && design == null) {
				design = m.group(2);
			} else if (design != null && expected == null && m.group(2).startsWith("tiny.bulwark:")) {
				expected = m.group(2);
			}
		}
		Path tiny = dir.resolve("tiny.bulwark");
		Files.writeString(tiny, design);
		CliRun run = CliRun.of("check", tiny.toString());
		assertEquals(1, run.exitCode(), run.err());
		assertEquals(List.of(expected.split("\n")), List.of(run.out().replace(tiny.toString(), "tiny.bulwark").split("\n")));
	}
}
