package bulwark.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "check", description = { "Checks design files; folders are searched for *.bulwark files.",
		"Text reports print one line per finding: FILE:LINE:COL: severity rule message" })
final class CheckCommand implements Callable<Integer> {
	@picocli.CommandLine.Mixin
	HelpOption help;

	@Parameters(arity = "1..*", paramLabel = "PATH", description = "Design files or folders.")
	List<Path> paths;

	@Mixin
	CheckOptions options = new CheckOptions();

	@Spec
	CommandSpec spec;

	@Override
	public Integer call() throws Exception {
		return Checks.run(paths, options, spec.commandLine().getOut(), spec.commandLine().getErr());
	}
}
