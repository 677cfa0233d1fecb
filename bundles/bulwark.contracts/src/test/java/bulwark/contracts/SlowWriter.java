package bulwark.contracts;

import java.nio.file.Path;

import bulwark.check.io.AtomicFile;

/** Writes a large file through AtomicFile, slowly, so that a test can kill it midway. */
public final class SlowWriter {
	private SlowWriter() {
	}

	public static void main(String[] args) throws Exception {
		byte[] chunk = "replacement text that must never be seen half written\n".repeat(1000).getBytes();
		AtomicFile.write(Path.of(args[0]), out -> {
			for (int i = 0; i < 10_000; i++) {
				out.write(chunk);
				out.flush();
				try {
					Thread.sleep(5);
				} catch (InterruptedException e) {
					throw new java.io.InterruptedIOException();
				}
			}
		}, true);
	}
}
