package bulwark.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "demo", description = "Checks the bundled demo designs (the examples folder).")
final class DemoCommand implements Callable<Integer> {
	@picocli.CommandLine.Mixin
	HelpOption help;

	@Mixin
	CheckOptions options = new CheckOptions();

	@Spec
	CommandSpec spec;

	@Override
	public Integer call() throws Exception {
		Path examples = Language.installation().examples();
		Path here = Path.of("").toAbsolutePath();
		if (examples.startsWith(here)) {
			examples = here.relativize(examples); // shorter lines when run from the Bulwark folder
		}
		if (!Files.isDirectory(examples)) {
			spec.commandLine().getErr().println("bulwark: demo designs not found at " + examples
					+ " (run it with the bulwark launcher of the installation)");
			return ExitCodes.USAGE;
		}
		return Checks.run(List.of(examples), options, spec.commandLine().getOut(), spec.commandLine().getErr());
	}
}
