package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * No message source of Bulwark's — the parser's messages, the validators, the linker's messages, the check,
 * the command line, the language server, the workbench — writes a sentence of the libraries underneath: the
 * parser generator's, the language framework's, the argument library's. Read from every string literal of the
 * product's sources; a pattern that recognises such a sentence (to replace it) is not a message and is skipped.
 */
class OwnWordsTest {
	private static final List<String> STOCK = List.of("mismatched input", "no viable alternative", "missing RULE",
			"extraneous input", "Couldn't resolve reference", "Unmatched argument", "Missing required", "Unknown option",
			"Invalid value for", "case-sensitive", "is not an int", "RULE_ID", "RULE_STRING", "RULE_NUMBER", "<EOF>");
	private static final Pattern LITERAL = Pattern.compile("\"((?:[^\"\\\\\\n]|\\\\.)*)\"");
	private static final List<String> PRODUCT = List.of("bulwark.lang", "bulwark.lang.ide", "bulwark.check", "bulwark.fix",
			"bulwark.lsp", "bulwark.cli", "bulwark.ui");

	@Test
	void noMessageSourceWritesALibrarysSentence() throws IOException {
		List<String> wrong = new ArrayList<>();
		int literals = 0;
		for (String bundle : PRODUCT) {
			Path src = Fixtures.root().resolve("bundles").resolve(bundle).resolve("src");
			try (Stream<Path> files = Files.walk(src)) {
				for (Path file : files.filter(f -> f.toString().endsWith(".java")).toList()) {
					List<String> lines = Files.readAllLines(file);
					for (int n = 0; n < lines.size(); n++) {
						String line = lines.get(n);
						if (line.contains("Pattern.compile(")) {
							continue; // recognises a library's sentence in order to replace it
						}
						Matcher m = LITERAL.matcher(line);
						while (m.find()) {
							literals++;
							for (String stock : STOCK) {
								if (m.group(1).contains(stock)) {
									wrong.add(Fixtures.root().relativize(file) + ":" + (n + 1) + ": \"" + stock + "\"");
								}
							}
						}
					}
				}
			}
		}
		assertTrue(literals > 1000, "the sources were not read: " + literals + " string literals");
		assertTrue(wrong.isEmpty(), "a library's words in a message:\n" + String.join("\n", wrong));
	}
}
