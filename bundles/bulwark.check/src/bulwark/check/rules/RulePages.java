package bulwark.check.rules;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/** A rule's explanation page, docs/rules/ID.md under the installation (the system property bulwark.home). */
public final class RulePages {
	private RulePages() {
	}

	public static Optional<String> page(String rule) {
		if (!rule.matches("[a-z]+(-[a-z]+)*")) {
			return Optional.empty();
		}
		Path file = Path.of(System.getProperty("bulwark.home", "."), "docs", "rules", rule + ".md");
		try {
			return Files.isRegularFile(file) ? Optional.of(Files.readString(file, StandardCharsets.UTF_8)) : Optional.empty();
		} catch (IOException e) {
			return Optional.empty();
		}
	}

	/** The page's "What" section, one paragraph: what the rule finds. */
	public static Optional<String> what(String rule) {
		return page(rule).map(text -> {
			int start = text.indexOf("## What");
			if (start < 0) {
				return null;
			}
			int end = text.indexOf("\n## ", start + 1);
			return text.substring(start + "## What".length(), end < 0 ? text.length() : end).strip();
		});
	}
}
