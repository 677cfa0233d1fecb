package bulwark.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;

import com.google.gson.stream.JsonWriter;

import bulwark.check.Preparation;
import bulwark.check.PreparedDesign;
import bulwark.check.cases.CaseOutcome;
import bulwark.check.compile.CaseRunner;
import bulwark.check.compile.CompiledDesign;
import bulwark.check.figures.Figures;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.OperatingPoint;
import bulwark.engine.solve.SolveFailure;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "solve", description = { "Solves a design's DC operating point and prints every net and part.",
		"Exit code 2 when the design has errors or the case does not converge." })
final class SolveCommand implements Callable<Integer> {
	@picocli.CommandLine.Mixin
	HelpOption help;

	enum Format {
		text, json
	}

	@Parameters(paramLabel = "FILE", description = "The design file.")
	Path file;

	@Option(names = "--case", paramLabel = "NAME", description = "The case to solve (default: the first, the normal condition).")
	String caseName;

	@Option(names = "--format", defaultValue = "text", description = "Output format: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
	Format format;

	@Spec
	CommandSpec spec;

	@Override
	public Integer call() throws Exception {
		PrintWriter out = spec.commandLine().getOut();
		PrintWriter err = spec.commandLine().getErr();
		Preparation prepared = Language.checker().prepare(file);
		if (prepared instanceof Preparation.Stopped stopped) {
			Stopping.explain(stopped, err);
			return ExitCodes.NOT_CHECKED;
		}
		PreparedDesign design = ((Preparation.Ready) prepared).design();
		CompiledDesign compiled = design.compiled();
		// the cases of the design's own policy, as its check solves them
		List<CaseOutcome> outcomes = CaseRunner.run(compiled, design.policy());
		CaseOutcome chosen = caseName == null ? outcomes.get(0)
				: outcomes.stream().filter(o -> o.faultCase().name().equals(caseName)).findFirst().orElse(null);
		if (chosen == null) {
			err.println("bulwark: no case named '" + caseName + "'; the cases are: "
					+ outcomes.stream().map(o -> "'" + o.faultCase().name() + "'").collect(Collectors.joining(", ")));
			return ExitCodes.USAGE;
		}
		if (format == Format.json) {
			json(compiled, chosen, out);
		} else {
			text(chosen, out);
		}
		out.flush();
		err.println("bulwark: " + bulwark.check.report.Caution.TEXT);
		err.flush();
		return chosen.result() instanceof DcSolution ? ExitCodes.CLEAN : ExitCodes.NOT_CHECKED;
	}

	@SuppressWarnings("resource") // the JSON writer only wraps the command's output, which picocli owns
	private static void json(CompiledDesign compiled, CaseOutcome outcome, PrintWriter out) throws Exception {
		JsonWriter w = new JsonWriter(out);
		w.setIndent("  ");
		w.beginObject();
		w.name("case").value(outcome.faultCase().name());
		w.name("caution").value(bulwark.check.report.Caution.TEXT);
		if (outcome.result() instanceof DcSolution s) {
			w.name("converged").value(true);
			w.name("iterations").value(s.iterations());
			w.name("strategy").value(s.strategy().name().toLowerCase(Locale.ROOT));
			w.name("nets").beginObject();
			for (int net = 0; net < s.circuit().netCount(); net++) {
				w.name(s.circuit().netName(net)).value(s.voltage(net));
			}
			w.endObject();
			w.name("parts").beginArray();
			for (OperatingPoint p : s.devices().values()) {
				w.beginObject();
				w.name("part").value(p.device());
				w.name("current").value(p.current());
				w.name("power").value(p.power());
				w.name("pins").beginObject();
				for (int i = 0; i < p.pinNames().length; i++) {
					w.name(p.pinNames()[i]).value(p.pinVoltages()[i]);
				}
				w.endObject();
				w.name("currents").beginObject();
				for (int i = 0; i < p.pinNames().length; i++) {
					w.name(p.pinNames()[i]).value(p.pinCurrents()[i]);
				}
				w.endObject();
				if (p.junctionNames().length > 0) {
					w.name("reverse").beginObject();
					for (int i = 0; i < p.junctionNames().length; i++) {
						w.name(p.junctionNames()[i]).value(p.reverseVoltages()[i]);
					}
					w.endObject();
				}
				w.endObject();
			}
			w.endArray();
		} else {
			SolveFailure f = (SolveFailure) outcome.result();
			w.name("converged").value(false);
			w.name("reason").value(f.reason().name().toLowerCase(Locale.ROOT).replace('_', '-'));
			w.name("place").value(f.place());
			w.name("message").value(f.message());
		}
		w.endObject();
		w.flush();
		out.println();
	}

	private static void text(CaseOutcome outcome, PrintWriter out) {
		String name = outcome.faultCase().name();
		if (!(outcome.result() instanceof DcSolution s)) {
			SolveFailure f = (SolveFailure) outcome.result();
			out.println("case '" + name + "': not solved: " + f.message());
			return;
		}
		out.println("case '" + name + "': solved in " + s.iterations() + " iteration(s) ("
				+ s.strategy().name().toLowerCase(Locale.ROOT).replace('_', ' ') + ")");
		out.println("nets:");
		for (int net = 0; net < s.circuit().netCount(); net++) {
			out.printf("  %-16s %s%n", s.circuit().netName(net), Figures.engineering(s.voltage(net), "V"));
		}
		out.println("parts:");
		for (OperatingPoint p : s.devices().values()) {
			StringBuilder pins = new StringBuilder();
			for (int i = 0; i < p.pinNames().length; i++) {
				pins.append(i == 0 ? "" : ", ").append(p.pinNames()[i]).append(' ')
						.append(Figures.engineering(p.pinVoltages()[i], "V"));
			}
			out.printf("  %-10s current %-10s power %-10s pins %s%n", p.device(), Figures.engineering(p.current(), "A"),
					Figures.engineering(p.power(), "W"), pins);
		}
	}
}
