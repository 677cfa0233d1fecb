package bulwark.check.fix;

/** Replace {@code length} characters at {@code offset} (line and column 1-based, for people) with {@code text}. */
public record TextEdit(int offset, int length, String text, int line, int column) {

	/** The text with this edit applied. */
	public String applyTo(String original) {
		return original.substring(0, offset) + text + original.substring(offset + length);
	}
}
