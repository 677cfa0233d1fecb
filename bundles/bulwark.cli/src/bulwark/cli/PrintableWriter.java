package bulwark.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.Writer;

import bulwark.check.report.Printable;

/**
 * Everything the command line prints goes through this: control characters from a design's title, a
 * finding's message or a file name are shown as {@code \u001B}, never sent to the terminal raw (where an
 * escape sequence could set its title or hide a line). Line ends, tabs and carriage returns pass.
 */
final class PrintableWriter extends FilterWriter {
	/** A high surrogate written last, waiting for its pair. */
	private char pending;

	PrintableWriter(Writer out) {
		super(out);
	}

	@Override
	public void write(int c) throws IOException {
		write(new char[] { (char) c }, 0, 1);
	}

	@Override
	public void write(char[] buf, int off, int len) throws IOException {
		write(new String(buf, off, len), 0, len);
	}

	@Override
	public void write(String str, int off, int len) throws IOException {
		String text = (pending != 0 ? String.valueOf(pending) : "") + str.substring(off, off + len);
		pending = 0;
		if (!text.isEmpty() && Character.isHighSurrogate(text.charAt(text.length() - 1))) {
			pending = text.charAt(text.length() - 1);
			text = text.substring(0, text.length() - 1);
		}
		out.write(Printable.of(text));
	}

	@Override
	public void flush() throws IOException {
		out.flush();
	}

	@Override
	public void close() throws IOException {
		if (pending != 0) {
			out.write(Printable.of(String.valueOf(pending)));
			pending = 0;
		}
		out.close();
	}
}
