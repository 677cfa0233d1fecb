package bulwark.check.finding;

/** Where in the design text a finding points: 1-based line and column, 0-based offset and its length. */
public record SourceLocation(int line, int column, int offset, int length) {
	public static final SourceLocation NONE = new SourceLocation(0, 0, 0, 0);
}
