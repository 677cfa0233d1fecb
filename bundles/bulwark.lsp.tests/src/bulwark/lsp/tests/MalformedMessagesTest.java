package bulwark.lsp.tests;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PipedInputStream;
import java.io.PipedOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import bulwark.lsp.BulwarkLanguageServer;

/**
 * Bytes no client should send — a length that is not a number, one far too large, a body that is not JSON,
 * lengths too short and too long — cost the message they spoil, never the connection: the server answers
 * the next well-formed request. And a completion asked far past the end of a document answers at once.
 */
class MalformedMessagesTest {
	private final LinkedBlockingQueue<JsonObject> answers = new LinkedBlockingQueue<>();

	private static byte[] frame(String json) {
		byte[] body = json.getBytes(StandardCharsets.UTF_8);
		return ("Content-Length: " + body.length + "\r\n\r\n" + json).getBytes(StandardCharsets.UTF_8);
	}

	private static String request(int id, String method, String params) {
		return "{\"jsonrpc\":\"2.0\",\"id\":" + id + ",\"method\":\"" + method + "\",\"params\":" + params + "}";
	}

	/** The answer with this id, skipping notifications; fails after the timeout. */
	private JsonObject answer(int id, long seconds) throws InterruptedException {
		long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(seconds);
		while (System.nanoTime() < deadline) {
			JsonObject m = answers.poll(100, TimeUnit.MILLISECONDS);
			if (m != null && m.has("id") && !m.get("id").isJsonNull() && m.get("id").getAsInt() == id) {
				return m;
			}
		}
		return null;
	}

	@Test
	void aMalformedMessageCostsItselfNotTheConnection() throws Exception {
		Path dir = Files.createTempDirectory("bulwark-lsp-malformed");
		PipedInputStream serverIn = new PipedInputStream(1 << 20), clientIn = new PipedInputStream(1 << 20);
		OutputStream toServer = new PipedOutputStream(serverIn);
		BulwarkLanguageServer.start(serverIn, new PipedOutputStream(clientIn));
		Thread reader = new Thread(() -> readFrames(clientIn), "client reader");
		reader.setDaemon(true);
		reader.start();

		String init = request(1, "initialize", "{\"processId\":null,\"rootUri\":\"" + dir.toUri() + "\",\"capabilities\":{}}");
		ByteArrayOutputStream bad = new ByteArrayOutputStream();
		bad.write("Content-Length: twelve\r\n\r\n{\"x\":1}".getBytes(StandardCharsets.US_ASCII));
		bad.write("Content-Length: 99999999999\r\n\r\n".getBytes(StandardCharsets.US_ASCII));
		bad.write("Content-Length: 9\r\n\r\n{not json".getBytes(StandardCharsets.US_ASCII));
		byte[] good = frame(request(7, "shutdown", "null"));
		// a length too short (the rest of the body runs into the next header), then one too long (it swallows
		// the next message's header, which must still be found)
		bad.write("Content-Length: 5\r\n\r\n{\"jsonrpc\":\"2.0\"}".getBytes(StandardCharsets.US_ASCII));
		bad.write(("Content-Length: 40\r\n\r\n{}").getBytes(StandardCharsets.US_ASCII));
		toServer.write(bad.toByteArray());
		toServer.write(frame(init));
		toServer.flush();
		JsonObject initialized = answer(1, 60);
		assertNotNull(initialized, "no answer to initialize after malformed messages: the server went deaf");
		assertTrue(initialized.has("result"), initialized.toString());
		toServer.write(frame("{\"jsonrpc\":\"2.0\",\"method\":\"initialized\",\"params\":{}}"));

		// a completion far past the end of a document answers at once, with nothing to offer
		String uri = dir.resolve("d.bulwark").toUri().toString();
		toServer.write(frame("{\"jsonrpc\":\"2.0\",\"method\":\"textDocument/didOpen\",\"params\":{\"textDocument\":{\"uri\":\""
				+ uri + "\",\"languageId\":\"bulwark\",\"version\":1,\"text\":\"design \\\"d\\\"\\nreference net gnd\\n\"}}}"));
		toServer.write(frame(request(2, "textDocument/completion",
				"{\"textDocument\":{\"uri\":\"" + uri + "\"},\"position\":{\"line\":2000000000,\"character\":2000000000}}")));
		toServer.flush();
		long started = System.nanoTime();
		JsonObject completion = answer(2, 30);
		assertNotNull(completion, "no answer to a completion past the end");
		assertTrue(TimeUnit.NANOSECONDS.toSeconds(System.nanoTime() - started) < 10, "the completion took long");
		assertTrue(completion.has("result") || completion.has("error"), completion.toString());

		toServer.write(good);
		toServer.flush();
		assertNotNull(answer(7, 30), "no answer to shutdown");
		toServer.write(frame("{\"jsonrpc\":\"2.0\",\"method\":\"exit\"}"));
		toServer.close();
	}

	private void readFrames(InputStream in) {
		try {
			while (true) {
				int length = -1;
				StringBuilder line = new StringBuilder();
				while (true) {
					int c = in.read();
					if (c < 0) {
						return;
					}
					if (c == '\n') {
						String l = line.toString().trim();
						line.setLength(0);
						if (l.isEmpty()) {
							break;
						}
						if (l.startsWith("Content-Length:")) {
							length = Integer.parseInt(l.substring(15).trim());
						}
					} else {
						line.append((char) c);
					}
				}
				byte[] body = in.readNBytes(length);
				answers.add(JsonParser.parseString(new String(body, StandardCharsets.UTF_8)).getAsJsonObject());
			}
		} catch (IOException e) {
			// the server closed its end
		}
	}
}
