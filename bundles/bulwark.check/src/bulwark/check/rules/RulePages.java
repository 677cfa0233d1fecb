package bulwark.check.rules;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import bulwark.check.finding.RuleId;
import bulwark.lang.install.Installation;

/** A rule's explanation page, docs/rules/ID.md of the installation: the one reader of it. */
public final class RulePages {
	private RulePages() {
	}

	public static Optional<String> page(Installation installation, RuleId rule) {
		Path file = installation.rulePage(rule.text());
		try {
			return Files.isRegularFile(file) ? Optional.of(Files.readString(file, StandardCharsets.UTF_8)) : Optional.empty();
		} catch (IOException e) {
			return Optional.empty();
		}
	}

	/** The page's "What" section, one paragraph: what the rule finds. */
	public static Optional<String> what(Installation installation, RuleId rule) {
		return page(installation, rule).map(text -> {
			int start = text.indexOf("## What");
			if (start < 0) {
				return null;
			}
			int end = text.indexOf("\n## ", start + 1);
			return text.substring(start + "## What".length(), end < 0 ? text.length() : end).strip();
		});
	}
}
