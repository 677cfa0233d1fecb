package bulwark.lsp;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.function.Consumer;

import com.google.gson.JsonElement;
import com.google.gson.JsonParser;
import com.google.gson.stream.JsonReader;

/**
 * The client's byte stream as the protocol layer reads it, with every message checked first: its header
 * must give a Content-Length within {@link #MAX_BODY} and its body must be one JSON object. A message that
 * is not is dropped, said so on standard error, and reading goes on from the next {@code Content-Length}
 * header wherever it stands — inside a bad header line or inside a body whose length was wrong — so that
 * one malformed message never leaves the server alive but deaf. What passes on is re-framed exactly.
 */
final class FramedInput extends InputStream {
	/** The largest body accepted: a design is at most 4 million characters (InputLimits), with room for JSON escapes. */
	static final int MAX_BODY = 64 << 20;
	/** A header line longer than this is garbage; its tail is kept in case a header starts there. */
	private static final int MAX_LINE = 8 << 10;
	private static final String LENGTH = "content-length:";

	private final InputStream raw;
	private final Consumer<String> problems;
	/** Bytes read ahead and given back: the rest of a bad body, from a Content-Length header found in it. */
	private byte[] back = new byte[0];
	private int backAt;
	/** The current message, re-framed, and how much of it was read. */
	private byte[] frame = new byte[0];
	private int frameAt;

	FramedInput(InputStream raw, Consumer<String> problems) {
		this.raw = new java.io.BufferedInputStream(raw);
		this.problems = problems;
	}

	@Override
	public int read() throws IOException {
		if (frameAt == frame.length && !nextFrame()) {
			return -1;
		}
		return frame[frameAt++] & 0xFF;
	}

	@Override
	public int read(byte[] b, int off, int len) throws IOException {
		if (len == 0) {
			return 0;
		}
		if (frameAt == frame.length && !nextFrame()) {
			return -1;
		}
		int n = Math.min(len, frame.length - frameAt);
		System.arraycopy(frame, frameAt, b, off, n);
		frameAt += n;
		return n;
	}

	@Override
	public void close() throws IOException {
		raw.close();
	}

	private int next() throws IOException {
		return backAt < back.length ? back[backAt++] & 0xFF : raw.read();
	}

	/** Reads until one good message is framed; false at the end of the stream. */
	private boolean nextFrame() throws IOException {
		while (true) {
			long length = -1;
			boolean headerSeen = false;
			// header lines up to an empty one; the last Content-Length found in them counts
			while (true) {
				String line = line();
				if (line == null) {
					return false;
				}
				if (line.isEmpty()) {
					if (headerSeen) {
						break;
					}
					continue; // blank lines between messages
				}
				headerSeen = true;
				long found = contentLength(line);
				if (found != -2) {
					length = found;
				}
			}
			if (length < 0 || length > MAX_BODY) {
				problems.accept(length < 0 ? "a message without a readable Content-Length header was dropped"
						: "a message of " + length + " bytes, over the " + MAX_BODY + " allowed, was dropped");
				continue;
			}
			byte[] body = new byte[(int) length];
			for (int read = 0; read < length; read++) {
				int c = next();
				if (c < 0) {
					return false;
				}
				body[read] = (byte) c;
			}
			if (isJsonObject(body)) {
				byte[] head = ("Content-Length: " + length + "\r\n\r\n").getBytes(StandardCharsets.US_ASCII);
				frame = new byte[head.length + body.length];
				System.arraycopy(head, 0, frame, 0, head.length);
				System.arraycopy(body, 0, frame, head.length, body.length);
				frameAt = 0;
				return true;
			}
			problems.accept("a message whose body is not one JSON object (" + length + " bytes) was dropped");
			giveBackFromHeader(body);
		}
	}

	/**
	 * One header line without its line end, or null at the end of the stream. From a Content-Length header
	 * inside the line on, when there is one: garbage before it (the tail of a short body) is not a header.
	 */
	private String line() throws IOException {
		ByteArrayOutputStream line = new ByteArrayOutputStream();
		int c;
		while ((c = next()) >= 0 && c != '\n') {
			if (c != '\r') {
				line.write(c);
			}
			if (line.size() > MAX_LINE) {
				byte[] all = line.toByteArray();
				line.reset();
				line.write(all, all.length - 64, 64);
			}
		}
		if (c < 0 && line.size() == 0) {
			return null;
		}
		return line.toString(StandardCharsets.ISO_8859_1);
	}

	/** The length a line gives (-1 when it is not a number), or -2 when the line is no Content-Length header. */
	private static long contentLength(String line) {
		int at = line.toLowerCase(Locale.ROOT).lastIndexOf(LENGTH);
		if (at < 0) {
			return -2;
		}
		String value = line.substring(at + LENGTH.length()).trim();
		if (!value.matches("[0-9]{1,12}")) {
			return -1;
		}
		return Long.parseLong(value);
	}

	private static boolean isJsonObject(byte[] body) {
		try (JsonReader reader = new JsonReader(new java.io.StringReader(new String(body, StandardCharsets.UTF_8)))) {
			JsonElement e = JsonParser.parseReader(reader);
			return e.isJsonObject() && reader.peek() == com.google.gson.stream.JsonToken.END_DOCUMENT;
		} catch (RuntimeException | IOException e) {
			return false;
		}
	}

	/** A body whose length was too long swallowed the next message's header: read on from that header. */
	private void giveBackFromHeader(byte[] body) {
		String text = new String(body, StandardCharsets.ISO_8859_1).toLowerCase(Locale.ROOT);
		int at = text.indexOf(LENGTH);
		if (at < 0) {
			return;
		}
		byte[] rest = new byte[body.length - at + (back.length - backAt)];
		System.arraycopy(body, at, rest, 0, body.length - at);
		System.arraycopy(back, backAt, rest, body.length - at, back.length - backAt);
		back = rest;
		backAt = 0;
	}
}
