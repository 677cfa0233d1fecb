package bulwark.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import bulwark.lang.naming.Suggestion;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;
import picocli.CommandLine.MissingParameterException;
import picocli.CommandLine.OverwrittenOptionException;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.UnmatchedArgumentException;

/**
 * A usage error in Bulwark's words: what was wrong with the arguments and what would be right, then the
 * command's usage line. The argument library's exceptions say which argument and which kind of mistake;
 * their sentences are never shown.
 */
final class UsageErrors {
	private static final String USAGE = "usage: ";

	private UsageErrors() {
	}

	/** The lines to print for a usage error (without the "bulwark: " of the first). */
	static List<String> of(ParameterException ex, String[] given) {
		CommandLine failed = ex.getCommandLine();
		String command = commandName(failed);
		List<String> lines = new ArrayList<>();
		lines.add(sentence(ex, failed, command));
		lines.add(USAGE + failed.getHelp().synopsis(USAGE.length()).strip());
		lines.add("'bulwark help" + (failed.getParent() == null ? "" : " " + failed.getCommandName())
				+ "' says more.");
		return lines;
	}

	private static String sentence(ParameterException ex, CommandLine failed, String command) {
		if (ex instanceof UnmatchedArgumentException u && !u.getUnmatched().isEmpty()) {
			String first = u.getUnmatched().get(0);
			if (first.startsWith("-")) {
				String name = first.contains("=") ? first.substring(0, first.indexOf('=')) : first;
				List<String> options = failed.getCommandSpec().options().stream().flatMap(o -> List.of(o.names()).stream())
						.toList();
				return "'" + name + "' is not an option of " + command + Suggestion.didYouMean(name, options);
			}
			if (failed.getParent() == null) {
				return "'" + first + "' is not a command of bulwark" + Suggestion.didYouMean(first,
						failed.getSubcommands().keySet()) + "; the commands are "
						+ String.join(", ", failed.getSubcommands().keySet());
			}
			return "'" + first + "' is more than " + command + " takes";
		}
		if (ex instanceof MissingParameterException m && !m.getMissing().isEmpty()) {
			ArgSpec missing = m.getMissing().get(0);
			if (missing instanceof OptionSpec o) {
				return o.longestName() + " needs its value: " + o.longestName() + " " + o.paramLabel();
			}
			PositionalParamSpec p = (PositionalParamSpec) missing;
			String what = String.join(" ", p.description()).strip();
			return command + " needs " + p.paramLabel() + (what.isEmpty() ? "" : ": " + lowerFirst(what));
		}
		if (ex instanceof OverwrittenOptionException o && o.getOverwritten() instanceof OptionSpec spec) {
			return spec.longestName() + " is given twice; give it once";
		}
		if (ex.getArgSpec() instanceof OptionSpec o && ex.getValue() != null) {
			Iterable<String> candidates = o.completionCandidates();
			List<String> choices = new ArrayList<>();
			if (candidates != null) {
				candidates.forEach(choices::add);
			}
			String value = ex.getValue();
			if (!choices.isEmpty()) {
				return "'" + value + "' is not a value " + o.longestName() + " takes" + Suggestion.didYouMean(value, choices)
						+ "; it takes " + String.join(", ", choices);
			}
			return "'" + value + "' is not a value " + o.longestName() + " takes: it takes " + o.paramLabel()
					+ kindOf(o.type());
		}
		if (ex.getArgSpec() instanceof PositionalParamSpec p && ex.getValue() != null) {
			return "'" + ex.getValue() + "' is not a value " + p.paramLabel() + " takes" + kindOf(p.type());
		}
		return "these arguments do not fit " + command;
	}

	private static String kindOf(Class<?> type) {
		if (type == int.class || type == Integer.class || type == long.class || type == Long.class) {
			return ", a whole number";
		}
		if (type == double.class || type == Double.class) {
			return ", a number";
		}
		return "";
	}

	/** The command as the user typed it, without the "bulwark" every message starts with: "check". */
	private static String commandName(CommandLine cl) {
		List<String> names = new ArrayList<>();
		for (CommandLine c = cl; c != null && c.getParent() != null; c = c.getParent()) {
			names.add(0, c.getCommandName());
		}
		return names.isEmpty() ? "bulwark" : names.stream().collect(Collectors.joining(" "));
	}

	private static String lowerFirst(String s) {
		return s.isEmpty() ? s : Character.toLowerCase(s.charAt(0)) + s.substring(1).replaceAll("\\.$", "");
	}
}
