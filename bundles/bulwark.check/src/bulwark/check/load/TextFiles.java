package bulwark.check.load;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.AccessDeniedException;

/**
 * Reads the text of a design, a policy or a library: only a regular file (a pipe would wait for ever, a
 * device such as /dev/zero would never end), never more than {@link #MAX_BYTES}, counted while reading so
 * that a file growing under the reader is stopped too. Every refusal is a sentence naming the reason.
 */
public final class TextFiles {
	/** Most bytes read of one file: the character limit in four-byte characters. */
	public static final long MAX_BYTES = 4L * InputLimits.MAX_CHARACTERS;

	/** The text, or why it was not read. */
	public sealed interface Read {
	}

	public record Text(String text) implements Read {
	}

	/** Why a file is not read; where in it, for a byte that is not UTF-8 (line and column from 1; 0 for none). */
	public record Refused(String reason, int line, int column) implements Read {
		public Refused(String reason) {
			this(reason, 0, 0);
		}
	}

	private TextFiles() {
	}

	/** The file's text as UTF-8, or the reason it is not read; {@code what} names it ("the design"). */
	public static Read read(Path file, String what) {
		if (Files.isDirectory(file)) {
			return new Refused(what + " " + file + " is a folder, not a file");
		}
		if (Files.exists(file) && !Files.isRegularFile(file)) {
			return new Refused(what + " " + file + " is not a regular file (a pipe, a device or a socket); "
					+ "Bulwark reads only files");
		}
		try {
			long size = Files.size(file);
			if (size > MAX_BYTES) {
				return new Refused(what + " " + file + " has " + size + " bytes; files are limited to "
						+ InputLimits.MAX_CHARACTERS + " characters");
			}
			byte[] bytes;
			try (InputStream in = Files.newInputStream(file)) {
				bytes = in.readNBytes((int) MAX_BYTES + 1);
			}
			if (bytes.length > MAX_BYTES) {
				return new Refused(what + " " + file + " grew past " + MAX_BYTES + " bytes while it was read");
			}
			try {
				return new Text(StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
						.onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString());
			} catch (CharacterCodingException e) {
				return notUtf8(what, file, bytes);
			}
		} catch (NoSuchFileException e) {
			return new Refused("cannot read the file " + file + ": it does not exist");
		} catch (AccessDeniedException e) {
			return new Refused("cannot read the file " + file + ": permission denied");
		} catch (IOException e) {
			return new Refused("cannot read the file " + file + ": " + e.getMessage());
		}
	}

	/**
	 * Where the first byte that is not UTF-8 stands, so that the designer can find it: "byte 0xE9 at line 4,
	 * column 6 is not UTF-8 (a file saved as Latin-1?); save it as UTF-8".
	 */
	static Refused notUtf8(String what, Path file, byte[] bytes) {
		java.nio.charset.CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
				.onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
		ByteBuffer in = ByteBuffer.wrap(bytes);
		java.nio.CharBuffer out = java.nio.CharBuffer.allocate(bytes.length + 1);
		decoder.decode(in, out, true);
		int bad = in.position();
		out.flip();
		int line = 1, column = 1;
		for (int i = 0; i < out.length(); i++) {
			char ch = out.charAt(i);
			if (ch == '\n') {
				line++;
				column = 1;
			} else if (!Character.isLowSurrogate(ch)) {
				column++;
			}
		}
		String shown = bad < bytes.length ? String.format(java.util.Locale.ROOT, "0x%02X", bytes[bad] & 0xFF) : "the last";
		return new Refused(String.format(java.util.Locale.ROOT,
				"%s %s is not UTF-8 text: byte %s at line %d, column %d is not UTF-8 (saved as Latin-1 or another "
						+ "code page?); save the file as UTF-8", what, file, shown, line, column), line, column);
	}
}
