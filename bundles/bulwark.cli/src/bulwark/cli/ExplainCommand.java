package bulwark.cli;

import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;

import bulwark.check.rules.Rule;
import bulwark.check.rules.RulePages;
import bulwark.check.rules.RuleRegistry;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "explain", description = "Explains a rule: what it checks, why, how, and from which source.")
final class ExplainCommand implements Callable<Integer> {
	@picocli.CommandLine.Mixin
	HelpOption help;

	@Parameters(paramLabel = "RULE", description = "A rule ID, as findings name it (for example resistor-power).")
	String rule;

	@Spec
	CommandSpec spec;

	@Override
	public Integer call() throws Exception {
		var out = spec.commandLine().getOut();
		var err = spec.commandLine().getErr();
		boolean known = RuleRegistry.all().stream().anyMatch(r -> r.info().id().text().equals(rule));
		java.util.Optional<String> page = known ? RulePages.page(Language.installation(), bulwark.check.finding.RuleId.of(rule)) : java.util.Optional.empty();
		if (page.isEmpty()) {
			err.println("bulwark: no rule '" + rule + "'; the rules are: "
					+ RuleRegistry.all().stream().map(Rule::info).map(i -> i.id().text()).collect(Collectors.joining(", ")));
			return ExitCodes.USAGE;
		}
		out.print(render(page.get()));
		out.flush();
		err.println("bulwark: " + bulwark.check.report.Caution.TEXT);
		err.flush();
		return ExitCodes.CLEAN;
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
