package bulwark.fuzz;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.xtext.util.CancelIndicator;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.load.DesignLoader;
import bulwark.check.rules.CheckContext;
import bulwark.check.rules.FigureRule;
import bulwark.check.rules.Rule;
import bulwark.check.finding.RuleInfo;
import bulwark.check.rules.RuleRegistry;
import bulwark.lang.BulwarkStandaloneSetup;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.lifecycle.BeforeContainer;

/**
 * Generated designs, well-formed and mangled, through the whole check. Whatever the text, the check must
 * end in a result — pass, fail, or not checked with located reasons — never in an exception, and never in
 * a fault of Bulwark's own (an "internal" finding, which the checker gives so that a batch goes on). The
 * seed is fixed, so that every run tries the same designs and a failure can be repeated; it is printed.
 */
class CheckFuzz {
	/** The seed of every property here; change it (and say so in the commit) to explore other designs. */
	static final String SEED = "20261202";
	private static final DesignChecker CHECKER = new DesignChecker(
			new DesignLoader(new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration(),
					bulwark.lang.install.Installation.fromLaunch()));
	private static final List<String> KINDS = List.of("resistor", "source", "battery", "diode", "zener", "led", "npn",
			"pnp", "nmos", "pmos", "comparator", "capacitor", "inductor", "potentiometer", "protector", "fuse",
			"indicator");
	private static final List<String> PINS = List.of("a", "b", "plus", "minus", "anode", "cathode", "collector",
			"base", "emitter", "drain", "gate", "source", "in_plus", "in_minus", "out", "supply_plus", "supply_minus",
			"wiper");
	private static final List<String> SETTINGS = List.of("value", "voltage", "resistance", "emf", "forward",
			"breakdown", "beta", "gain", "trip", "position", "rated power", "rated voltage", "rated reverse", "colour");
	private static final List<String> UNITS = List.of("Ω", "kΩ", "MΩ", "V", "mV", "A", "mA", "W", "mW", "F", "nF", "H",
			"µH", "s", "", "k", "furlong");

	@Provide
	Arbitrary<String> designs() {
		Arbitrary<Integer> net = Arbitraries.integers().between(0, 6);
		Arbitrary<String> quantity = Combinators.combine(Arbitraries.doubles().between(-1e6, 1e6).ofScale(3),
				Arbitraries.of(UNITS)).as((v, u) -> v + " " + u);
		Arbitrary<String> setting = Combinators.combine(Arbitraries.of(SETTINGS), quantity).as((s, q) -> s + " " + q);
		Arbitrary<String> pin = Combinators.combine(Arbitraries.of(PINS), net).as((p, n) -> p + ": n" + n);
		Arbitrary<String> part = Combinators.combine(Arbitraries.of(KINDS), Arbitraries.integers().between(1, 30),
				pin.list().ofMinSize(1).ofMaxSize(5), setting.list().ofMaxSize(5))
				.as((k, i, pins, settings) -> k + " P" + i + " (" + String.join(", ", pins) + ") { "
						+ String.join(" ", settings) + " }");
		Arbitrary<String> action = Combinators.combine(Arbitraries.of("apply", "connect", "short"), quantity,
				Arbitraries.integers().between(0, 2), Arbitraries.integers().between(0, 2))
				.as((a, q, f, t) -> a.equals("short") ? "short T" + f + " to T" + t : a + " " + q + " from T" + f + " to T" + t);
		Arbitrary<String> member = Arbitraries.oneOf(part, part, part,
				action.list().ofMaxSize(3).map(as -> "case \"c\" { " + String.join(" ", as) + " }"),
				net.map(n -> "waive \"resistor-power\" on P" + n + " because \"r\" by \"w\" on \"2026-11-30\""));
		Arbitrary<String> body = member.list().ofMaxSize(12).map(ms -> String.join("\n", ms));
		return body.map(b -> {
			StringBuilder text = new StringBuilder("design \"fuzz\"\nreference net n0\n");
			for (int i = 1; i <= 6; i++) {
				text.append("net n").append(i).append('\n');
			}
			text.append("terminal T0 at n0\nterminal T1 at n1\nterminal T2 at n2\n");
			return text.append(b).append('\n').toString();
		});
	}

	@Provide
	Arbitrary<String> mangled() {
		return Combinators.combine(designs(), Arbitraries.integers().between(0, 10_000),
				Arbitraries.integers().between(1, 20), Arbitraries.strings().ofMaxLength(6))
				.as((text, at, cut, insert) -> {
					int from = Math.min(at, text.length());
					int to = Math.min(from + cut, text.length());
					return text.substring(0, from) + insert + text.substring(to);
				});
	}

	/** The seeds in corpus/: the demo designs, a library, a policy and a design using every construct once. */
	static final java.util.List<String> CORPUS = corpus();

	private static java.util.List<String> corpus() {
		java.nio.file.Path dir = java.nio.file.Path.of(System.getProperty("bulwark.fuzz.corpus", "corpus"));
		try (var files = java.nio.file.Files.list(dir)) {
			java.util.List<String> texts = new java.util.ArrayList<>();
			for (java.nio.file.Path f : files.sorted().toList()) {
				texts.add(java.nio.file.Files.readString(f));
			}
			if (texts.isEmpty()) {
				throw new IllegalStateException("empty fuzzing corpus in " + dir.toAbsolutePath());
			}
			return texts;
		} catch (java.io.IOException e) {
			throw new java.io.UncheckedIOException(e);
		}
	}

	/** A corpus seed with one random cut replaced by random characters, or two lines swapped. */
	@Provide
	Arbitrary<String> mangledSeeds() {
		return Combinators.combine(Arbitraries.of(CORPUS), Arbitraries.integers().between(0, 5_000),
				Arbitraries.integers().between(0, 40), Arbitraries.strings().ofMaxLength(8), Arbitraries.integers().between(0, 60))
				.as((text, at, cut, insert, swap) -> {
					int from = Math.min(at, text.length());
					int to = Math.min(from + cut, text.length());
					String mangled = text.substring(0, from) + insert + text.substring(to);
					String[] lines = mangled.split("\n", -1);
					if (lines.length > 2) {
						int i = swap % lines.length, j = (swap * 7 + 3) % lines.length;
						String t = lines[i];
						lines[i] = lines[j];
						lines[j] = t;
					}
					return String.join("\n", lines);
				});
	}

	/**
	 * A corpus seed with one of the mutations that once broke the check: every rating deleted, power and
	 * current units swapped for voltage ones (in a library too: the corpus holds one), a flood of brackets,
	 * a number with hundreds of digits.
	 */
	@Provide
	Arbitrary<String> hostileSeeds() {
		return Combinators.combine(Arbitraries.of(CORPUS), Arbitraries.integers().between(0, 3),
				Arbitraries.integers().between(0, 5_000), Arbitraries.integers().between(1, 5_000))
				.as((text, kind, at, n) -> switch (kind) {
				case 0 -> text.replaceAll("rated [a-z_]+ -?[0-9.]+ ?[a-zA-Zµ°Ω%]*", "");
				case 1 -> text.replace("mW", "kV").replace(" W", " V").replace("mA", "mV");
				case 2 -> text.substring(0, Math.min(at, text.length())) + "[\n".repeat(n)
						+ text.substring(Math.min(at, text.length()));
				default -> text.replaceFirst("(?<=\\s)[0-9]+(?=[. ])", "1" + "0".repeat(300 + n % 200));
				});
	}

	@Property(seed = SEED)
	void hostileSeedsEndInAResult(@ForAll("hostileSeeds") String text) {
		checkSurvives(CHECKER, text);
	}

	@BeforeContainer
	static void printSeed() {
		System.out.println("CheckFuzz: seed " + SEED);
	}

	@Property(seed = SEED)
	void mangledSeedsEndInAResult(@ForAll("mangledSeeds") String text) {
		checkSurvives(CHECKER, text);
	}

	@Property(seed = SEED)
	void wellFormedDesignsEndInAResult(@ForAll("designs") String text) {
		checkSurvives(CHECKER, text);
	}

	@Property(seed = SEED)
	void mangledDesignsEndInAResult(@ForAll("mangled") String text) {
		checkSurvives(CHECKER, text);
	}

	/** The properties above can fail: with a rule that crashes, a design the check reaches fails them. */
	@Example
	void aRuleThatCrashesFailsTheFuzzRun() {
		Rule crashing = new FigureRule() {
			@Override
			public RuleInfo info() {
				return RuleRegistry.all().get(0).info();
			}

			@Override
			public void check(CheckContext context, Consumer<Finding> findings) {
				throw new IllegalStateException("a fault planted by the test");
			}
		};
		DesignChecker broken = CHECKER.withRules(List.of(crashing));
		String design = "design \"x\"\nreference net n0\nnet n1\nsource V1 (plus: n1, minus: n0) { voltage 5 V }\n"
				+ "resistor R1 (a: n1, b: n0) { value 1 kΩ rated power 250 mW }\n";
		checkSurvives(CHECKER, design); // the same design passes the property with the real rules
		assertThrows(AssertionError.class, () -> checkSurvives(broken, design));
	}

	static void checkSurvives(DesignChecker checker, String text) {
		DesignResult r = checker.check(text, "fuzz.bulwark", CancelIndicator.NullImpl);
		assertNotNull(r.status());
		for (Finding f : r.findings()) {
			assertNotNull(f.message());
			assertFalse(f.rule().text().equals("internal"), () -> "a fault of Bulwark's own: " + f.message() + "\n" + text);
			if (f.rule().text().equals("syntax") || f.rule().text().equals("structure")) {
				assertTrue(f.location().line() >= 1, () -> "unlocated: " + f + "\n" + text);
			}
		}
	}
}
