package bulwark.cli;

import java.io.PrintWriter;
import java.util.List;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The top-level command: its subcommands do the work. */
@Command(name = "bulwark", versionProvider = Version.class,
		description = { "Checks instrument input designs against their ratings and abuse at the terminals.", "",
				bulwark.check.report.Caution.TEXT },
		subcommands = { CheckCommand.class, ClassroomCommand.class, LspCommand.class, ToleranceCommand.class, SolveCommand.class, CompareCommand.class, ExplainCommand.class, DemoCommand.class, WorkbenchCommand.class,
				HelpTopicCommand.class },
		footer = { "", "Exit codes: 0 no error finding, 1 error findings, 2 a design could not be checked, "
				+ "3 usage error." })
public final class BulwarkCommand implements Runnable {
	@CommandLine.Mixin
	HelpOption help;

	@CommandLine.Option(names = { "-V", "--version" }, versionHelp = true, description = "Shows Bulwark's version.")
	boolean version;

	@CommandLine.Spec
	CommandLine.Model.CommandSpec spec;

	@Override
	public void run() {
		spec.commandLine().usage(spec.commandLine().getOut());
	}

	/** Runs the command line with the given streams and returns its exit code; never calls System.exit. */
	public static int run(String[] args, PrintWriter rawOut, PrintWriter rawErr) {
		PrintWriter out = new PrintWriter(new PrintableWriter(rawOut), true);
		PrintWriter err = new PrintWriter(new PrintableWriter(rawErr), true);
		CommandLine.tracer().setLevel(CommandLine.TraceLevel.OFF); // the library's own warnings are not ours to print
		CommandLine cli = new CommandLine(new BulwarkCommand());
		cli.setOut(out);
		cli.setErr(err);
		cli.setParameterExceptionHandler((ex, given) -> {
			List<String> lines = UsageErrors.of(ex, given);
			PrintWriter e = ex.getCommandLine().getErr();
			e.println("bulwark: " + lines.get(0));
			lines.subList(1, lines.size()).forEach(e::println);
			return ExitCodes.USAGE;
		});
		cli.setExecutionExceptionHandler((ex, failed, parsed) -> {
			// an unexpected fault: say what it was rather than claim a result
			failed.getErr().println("bulwark: the check stopped: " + ex);
			return ExitCodes.NOT_CHECKED;
		});
		int code = cli.execute(args);
		out.flush();
		err.flush();
		rawOut.flush();
		rawErr.flush();
		return code;
	}
}
