package bulwark.cli;

import picocli.CommandLine.Option;

/** -h / --help on every command, in Bulwark's words (the argument library's own option says it in its own). */
final class HelpOption {
	@Option(names = { "-h", "--help" }, usageHelp = true, description = "Shows this command's help.")
	boolean help;
}
