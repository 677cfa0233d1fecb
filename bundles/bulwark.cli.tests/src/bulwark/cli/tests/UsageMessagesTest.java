package bulwark.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Every usage error in Bulwark's words, with the command's usage line after it, and never a sentence or a
 * banner of the argument library underneath.
 */
class UsageMessagesTest {
	/** The argument library's own phrases. */
	private static final List<String> STOCK = List.of("Unmatched argument", "Unknown option", "Missing required",
			"Invalid value", "case-sensitive", "is not an int", "Try '", "WARN", "picocli", "Expected parameter");

	private static final String LAB = "lab-indicator-seeded.bulwark";

	private static String usageError(String... args) {
		CliRun run = CliRun.of(args);
		assertEquals(3, run.exitCode(), run.err());
		for (String stock : STOCK) {
			assertTrue(!run.err().contains(stock) && !run.out().contains(stock), "'" + stock + "' in: " + run.err());
		}
		assertTrue(run.err().lines().anyMatch(l -> l.startsWith("usage: bulwark")), "no usage line: " + run.err());
		return run.err().lines().findFirst().orElse("");
	}

	@Test
	void anUnknownCommandIsNamedWithTheNearestOne() {
		assertEquals("bulwark: 'chek' is not a command of bulwark (did you mean 'check'?); the commands are check, "
				+ "classroom, lsp, tolerance, solve, compare, explain, demo, workbench, help", usageError("chek"));
	}

	@Test
	void anUnknownOptionIsNamedWithTheNearestOne() {
		assertEquals("bulwark: '--polcy' is not an option of check (did you mean '--policy'?)",
				usageError("check", "--polcy", "x.bulwark", CliRun.example(LAB)));
		assertEquals("bulwark: '--frob' is not an option of check", usageError("check", "--frob", CliRun.example(LAB)));
	}

	@Test
	void aValueOutsideTheChoicesListsThem() {
		assertEquals("bulwark: 'jsn' is not a value --format takes (did you mean 'json'?); it takes text, json, sarif, "
				+ "junit, html", usageError("check", "--format", "jsn", CliRun.example(LAB)));
		assertEquals("bulwark: 'x' is not a value --jobs takes: it takes N, a whole number",
				usageError("check", "--jobs", "x", CliRun.example(LAB)));
	}

	@Test
	void somethingMissingSaysWhat() {
		assertEquals("bulwark: check needs PATH: design files or folders", usageError("check"));
		assertEquals("bulwark: --policy needs its value: --policy FILE", usageError("check", "--policy"));
		assertEquals("bulwark: explain needs RULE: a rule ID, as findings name it (for example resistor-power)",
				usageError("explain"));
	}

	@Test
	void tooManyArgumentsAreNamed() {
		assertEquals("bulwark: 'b.bulwark' is more than solve takes", usageError("solve", "a.bulwark", "b.bulwark"));
	}

	/** The argument library's own help sentences, which its standard options and help command carry. */
	private static final List<String> STOCK_HELP = List.of("Show this help message and exit",
			"Print version information and exit", "Display help information about the specified command",
			"Show usage help for the help command", "The COMMAND to display the usage help message for");

	/** --help on every command, and help itself, in Bulwark's words; a command's required options do not stop it. */
	@Test
	void helpIsInOurWordsEverywhere() {
		List<String[]> asked = new java.util.ArrayList<>(List.of(new String[] { "--help" }, new String[] { "help" },
				new String[] { "help", "help" }));
		for (String command : List.of("check", "classroom", "lsp", "tolerance", "solve", "compare", "explain", "demo",
				"workbench")) {
			asked.add(new String[] { command, "--help" });
			asked.add(new String[] { command, "-h" });
		}
		for (String[] args : asked) {
			CliRun run = CliRun.of(args);
			String what = String.join(" ", args);
			assertEquals(0, run.exitCode(), what + ": " + run.err());
			assertTrue(run.out().startsWith("Usage: bulwark"), what + ": " + run.out());
			for (String stock : STOCK_HELP) {
				assertTrue(!run.out().contains(stock) && !run.err().contains(stock), "'" + stock + "' in " + what + ": " + run.out());
			}
		}
		CliRun unknown = CliRun.of("help", "chek");
		assertEquals(3, unknown.exitCode(), unknown.err());
		assertTrue(unknown.err().startsWith("bulwark: 'chek' is not a command of bulwark; the commands are check,"), unknown.err());
	}

	@Test
	void everyCommandHasHelp() {
		for (String command : List.of("check", "classroom", "lsp", "tolerance", "solve", "compare", "explain", "demo",
				"workbench")) {
			CliRun help = CliRun.of("help", command);
			assertEquals(0, help.exitCode(), command + ": " + help.err());
			assertTrue(help.out().contains("bulwark " + command), command + ": " + help.out());
		}
	}
}
