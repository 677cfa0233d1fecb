package bulwark.cli;

import java.util.List;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * The workbench's place in the command line's help. The workbench is an application of its own, which the
 * bulwark launcher starts (it needs the windowing toolkit and a workspace); this command only says so.
 */
@Command(name = "workbench", description = {
		"Starts the schematic review workbench, opening the given designs: findings marked as you type, the "
				+ "stress map, the sweep and waveform plots, quick fixes and waivers.",
		"Started by the bulwark launcher (./bulwark workbench), which gives it its display and 1 GB of memory." })
final class WorkbenchCommand implements Callable<Integer> {
	@picocli.CommandLine.Mixin
	HelpOption help;

	@Option(names = "--policy", paramLabel = "FILE", description = "The review policy every design is checked under.")
	String policy;

	@Parameters(arity = "0..*", paramLabel = "FILE", description = "Designs to open.")
	List<String> files;

	@Spec
	CommandSpec spec;

	@Override
	public Integer call() {
		spec.commandLine().getErr().println("bulwark: the workbench is started by the bulwark launcher: "
				+ "./bulwark workbench [--policy FILE] [FILE...]");
		return ExitCodes.USAGE;
	}
}
