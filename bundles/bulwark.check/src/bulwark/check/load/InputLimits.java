package bulwark.check.load;

import java.util.Optional;
import bulwark.check.finding.Finding;
import bulwark.check.finding.SourceLocation;
import bulwark.check.finding.CheckerRules;

/**
 * Sizes beyond which a design is refused before parsing, with a located reason: a design file of an input
 * stage is a few hundred lines, so these only stop mistakes (a binary or log file checked by accident) and
 * hostile input from costing minutes or memory. [common practice: limits well above real use]
 */
public final class InputLimits {
	/** Largest design file, in characters. */
	public static final int MAX_CHARACTERS = 4_000_000;
	/** Longest line, in characters. */
	public static final int MAX_LINE = 20_000;

	private InputLimits() {
	}

	/** A finding saying why the text is refused, or empty when it is within the limits. */
	public static Optional<Finding> check(String text) {
		if (text.length() > MAX_CHARACTERS) {
			return Optional.of(refusal("the file has " + text.length() + " characters; designs are limited to "
					+ MAX_CHARACTERS, new SourceLocation(1, 1, 0, 0)));
		}
		int line = 1, start = 0;
		for (int i = 0; i <= text.length(); i++) {
			if (i == text.length() || text.charAt(i) == '\n') {
				if (i - start > MAX_LINE) {
					return Optional.of(refusal("line " + line + " has " + (i - start) + " characters; lines are limited to "
							+ MAX_LINE, new SourceLocation(line, MAX_LINE + 1, start + MAX_LINE, 0)));
				}
				line++;
				start = i + 1;
			}
		}
		if (text.indexOf('\0') >= 0) {
			int at = text.indexOf('\0');
			int lineOf = (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
			int col = at - text.lastIndexOf('\n', at - 1);
			return Optional.of(refusal("the file holds binary data (a NUL character); is it a design file?",
					new SourceLocation(lineOf, col, at, 1)));
		}
		return Optional.empty();
	}

	private static Finding refusal(String message, SourceLocation where) {
		return Finding.of(CheckerRules.FILE, message).at(where);
	}
}
