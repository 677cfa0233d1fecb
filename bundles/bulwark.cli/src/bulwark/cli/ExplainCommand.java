package bulwark.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;

import bulwark.check.rules.Rule;
import bulwark.check.rules.RuleRegistry;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "explain", description = "Explains a rule: what it checks, why, how, and from which source.")
final class ExplainCommand implements Callable<Integer> {
	@Parameters(paramLabel = "RULE", description = "A rule ID, as findings name it (for example resistor-power).")
	String rule;

	@Spec
	CommandSpec spec;

	@Override
	public Integer call() throws Exception {
		var out = spec.commandLine().getOut();
		var err = spec.commandLine().getErr();
		boolean known = RuleRegistry.all().stream().anyMatch(r -> r.info().id().equals(rule));
		Path file = Path.of(System.getProperty("bulwark.home", "."), "docs", "rules", rule + ".md");
		if (!known || !Files.isRegularFile(file)) {
			err.println("bulwark: no rule '" + rule + "'; the rules are: "
					+ RuleRegistry.all().stream().map(Rule::info).map(i -> i.id()).collect(Collectors.joining(", ")));
			return ExitCodes.USAGE;
		}
		out.print(render(Files.readString(file, StandardCharsets.UTF_8)));
		out.flush();
		return ExitCodes.CLEAN;
	}

	/** The explanation page of a rule (Markdown), or null when there is none. */
	static String page(String rule) {
		Path file = Path.of(System.getProperty("bulwark.home", "."), "docs", "rules", rule + ".md");
		try {
			return Files.isRegularFile(file) ? Files.readString(file, StandardCharsets.UTF_8) : null;
		} catch (java.io.IOException e) {
			return null;
		}
	}

	/** Markdown for a terminal: headings underlined, code blocks indented, emphasis marks dropped. */
	static String render(String markdown) {
		StringBuilder text = new StringBuilder();
		boolean code = false;
		for (String line : markdown.split("\n", -1)) {
			if (line.startsWith("```")) {
				code = !code;
				continue;
			}
			if (code) {
				text.append("    ").append(line).append('\n');
			} else if (line.startsWith("# ")) {
				String title = line.substring(2).trim();
				text.append(title.toUpperCase(Locale.ROOT)).append('\n').append("=".repeat(title.length())).append('\n');
			} else if (line.startsWith("## ")) {
				String title = line.substring(3).trim();
				text.append(title).append('\n').append("-".repeat(title.length())).append('\n');
			} else {
				text.append(line.replace("**", "").replace("`", "")).append('\n');
			}
		}
		return text.toString().stripTrailing() + "\n";
	}
}
