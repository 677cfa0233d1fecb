package bulwark.cli.tests;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

import bulwark.cli.BulwarkCommand;

/** One run of the command line in this JVM, with its exit code and both output streams. */
record CliRun(int exitCode, String out, String err) {

	static CliRun of(String... args) {
		StringWriter out = new StringWriter();
		StringWriter err = new StringWriter();
		int code = BulwarkCommand.run(args, new PrintWriter(out), new PrintWriter(err));
		return new CliRun(code, out.toString(), err.toString());
	}

	static Path root() {
		return Path.of(System.getProperty("bulwark.root", "../..")).toAbsolutePath().normalize();
	}

	static String example(String name) {
		return root().resolve("examples").resolve(name).toString();
	}
}
