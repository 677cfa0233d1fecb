package bulwark.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Help;
import picocli.CommandLine.Parameters;

/** {@code bulwark help [COMMAND]}: a command's help, or Bulwark's own, in Bulwark's words. */
@Command(name = "help", helpCommand = true, description = "Shows the help of a command, for example: bulwark help check.")
final class HelpTopicCommand implements Callable<Integer>, CommandLine.IHelpCommandInitializable2 {
	@Parameters(arity = "0..1", paramLabel = "COMMAND", description = "The command to explain; without it, Bulwark's own help.")
	String command;

	private CommandLine self;
	private PrintWriter out;
	private PrintWriter err;
	private Help.ColorScheme colours;

	@Override
	public void init(CommandLine helpCommandLine, Help.ColorScheme colorScheme, PrintWriter outWriter,
			PrintWriter errWriter) {
		this.self = helpCommandLine;
		this.colours = colorScheme;
		this.out = outWriter;
		this.err = errWriter;
	}

	@Override
	public Integer call() {
		CommandLine top = self.getParent();
		if (command == null) {
			top.usage(out, colours);
			return ExitCodes.CLEAN;
		}
		CommandLine topic = top.getSubcommands().get(command);
		if (topic == null) {
			err.println("bulwark: '" + command + "' is not a command of bulwark; the commands are "
					+ String.join(", ", top.getSubcommands().keySet()));
			return ExitCodes.USAGE;
		}
		topic.usage(out, colours);
		return ExitCodes.CLEAN;
	}
}
