package bulwark.check.report;

/**
 * Text as it may reach a terminal or an XML file: every control character (C0 but tab, line feed and
 * carriage return; DEL; C1), the Unicode line and paragraph separators and any unpaired surrogate become a
 * visible {@code \u001B}. A design's title or a file name can hold an escape sequence that would retitle a
 * terminal or hide a line, and such characters make XML ill-formed; the report shows them instead.
 */
public final class Printable {
	private Printable() {
	}

	public static String of(String text) {
		if (text == null) {
			return null;
		}
		int n = text.length();
		StringBuilder s = null;
		for (int i = 0; i < n; i++) {
			char c = text.charAt(i);
			boolean unsafe = unsafe(c) || Character.isHighSurrogate(c) && (i + 1 >= n || !Character.isLowSurrogate(text.charAt(i + 1)))
					|| Character.isLowSurrogate(c) && (i == 0 || !Character.isHighSurrogate(text.charAt(i - 1)));
			if (unsafe && s == null) {
				s = new StringBuilder(n + 16).append(text, 0, i);
			}
			if (unsafe) {
				s.append(String.format("\\u%04X", (int) c));
			} else if (s != null) {
				s.append(c);
			}
		}
		return s == null ? text : s.toString();
	}

	/** A character that is never written as it is. */
	public static boolean unsafe(char c) {
		return c < 0x20 && c != '\t' && c != '\n' && c != '\r' || c >= 0x7F && c <= 0x9F || c == '\u2028' || c == '\u2029';
	}
}
