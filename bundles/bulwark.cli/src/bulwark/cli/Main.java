package bulwark.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;

/**
 * Entry point of the command line. Runs as plain Java on a flat class path (no OSGi), so that a check
 * starts quickly. Exit codes: 0 no error finding, 1 error findings, 2 a design could not be checked,
 * 3 usage error.
 */
public final class Main {
	private Main() {
	}

	public static void main(String[] args) {
		PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
		PrintWriter err = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
		System.exit(BulwarkCommand.run(args, out, err));
	}
}
