package bulwark.fix.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.eclipse.xtext.util.CancelIndicator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.fix.Fix;
import bulwark.check.load.DesignLoader;
import bulwark.lang.BulwarkStandaloneSetup;
import bulwark.fix.PreferredValues;
import bulwark.fix.QuickFixes;

/** Quick fixes compute their values, and are offered only when a full re-check proves them. */
class QuickFixesTest {
	private static final DesignChecker CHECKER = new DesignChecker(
			new DesignLoader(new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration(),
					bulwark.lang.install.Installation.fromLaunch()));

	private static Map<Finding, List<Fix>> fixes(Path file) throws Exception {
		String text = Files.readString(file);
		DesignResult r = CHECKER.check(text, file.toString(), CancelIndicator.NullImpl);
		return QuickFixes.of(CHECKER, text, file.toString(), r);
	}

	private static Fix only(Map<Finding, List<Fix>> fixes, String rule) {
		List<Fix> list = fixes.entrySet().stream().filter(e -> e.getKey().rule().text().equals(rule))
				.flatMap(e -> e.getValue().stream()).toList();
		assertEquals(1, list.size(), fixes.toString());
		return list.get(0);
	}

	@Test
	void raiseAPowerRatingToTheStepThatHolds(@TempDir Path dir) throws Exception {
		Path lab = dir.resolve("lab.bulwark");
		Files.copy(root().resolve("examples/lab-indicator-seeded.bulwark"), lab);
		Files.copy(root().resolve("examples/teaching-lab.bulwark-policy"), dir.resolve("teaching-lab.bulwark-policy"));
		Fix fix = only(fixes(lab), "resistor-power");
		// 0.96 W with the output shorted, derated to 60 %: at least 1.6 W, so the 2 W step [closed form]
		assertEquals("raise R_DROP's rated power 125 mW → 2 W (1280 % → 80 % of the limit)", fix.label());
		assertEquals(2.0, fix.after().get("rated"), 0);
		String fixed = fix.applyTo(Files.readString(lab));
		assertTrue(fixed.contains("  rated power 2 W\n"), fixed);
		DesignResult after = CHECKER.check(fixed, lab.toString(), CancelIndicator.NullImpl);
		assertTrue(after.findings().stream().noneMatch(f -> f.rule().text().equals("resistor-power")), after.findings().toString());
	}

	/**
	 * Each proposal is a whole check of the changed design: the search stops at its time limit and says so,
	 * rather than running for minutes on a design whose check takes seconds.
	 */
	@Test
	void theSearchStopsAtItsTimeLimitAndSaysSo(@TempDir Path dir) throws Exception {
		Path lab = dir.resolve("lab.bulwark");
		Files.copy(root().resolve("examples/lab-indicator-seeded.bulwark"), lab);
		Files.copy(root().resolve("examples/teaching-lab.bulwark-policy"), dir.resolve("teaching-lab.bulwark-policy"));
		String text = Files.readString(lab);
		DesignResult r = CHECKER.check(text, lab.toString(), CancelIndicator.NullImpl);
		QuickFixes.Search unhurried = QuickFixes.search(CHECKER, text, lab.toString(), r, java.time.Duration.ofMinutes(5));
		assertTrue(unhurried.complete());
		assertTrue(!unhurried.fixes().isEmpty());
		QuickFixes.Search hurried = QuickFixes.search(CHECKER, text, lab.toString(), r, java.time.Duration.ZERO);
		assertTrue(!hurried.complete());
		assertTrue(hurried.fixes().isEmpty(), hurried.fixes().toString());
	}

	/** A fix's figures read as a finding's do, never as a map of raw doubles. */
	@Test
	void aFixsFiguresAreWrittenForPeople() {
		Map<String, Double> figures = new java.util.LinkedHashMap<>();
		figures.put("rated", 0.125);
		figures.put("utilisation", 2.38581560283688);
		figures.put("series_ohms", 1e5);
		figures.put("parts", 2.0);
		assertEquals("rated 0.125, utilisation 239 %, series ohms 100 kΩ, parts 2", bulwark.check.figures.NamedFigures.of(figures));
	}

	@Test
	void raiseAPulseRatingForASurge(@TempDir Path dir) throws Exception {
		Files.writeString(dir.resolve("surge.bulwark-policy"), "policy \"surge only\"\n  mains none\n  surge 1 kV behind 2 Ω\n");
		Path design = dir.resolve("d.bulwark");
		Files.writeString(design, """
				design "a surge into a resistor"
				policy "surge.bulwark-policy"
				reference net gnd
				net tip
				terminal TIP at tip
				terminal COM at gnd common
				resistor R1 (a: tip, b: gnd) { value 100 Ω rated power 2 W rated voltage 2 kV rated pulse 200 mJ }
				""");
		Fix fix = only(fixes(design), "surge-energy");
		// 342 mJ from the 1 kV wave behind 2 Ω (SurgeEnergyRuleTest's closed form), no derating: the 0.5 J step
		assertEquals("raise R1's rated pulse 200 mJ → 500 mJ (171 % → 68 % of the limit)", fix.label());
		assertTrue(fix.applyTo(Files.readString(design)).contains("rated pulse 500 mJ"));
	}

	@Test
	void splitAResistorOverItsVoltage(@TempDir Path dir) throws Exception {
		Path design = dir.resolve("d.bulwark");
		Files.writeString(design, """
				design "one resistor across the terminals"
				reference net gnd
				net tip
				terminal TIP at tip
				terminal COM at gnd common
				resistor R1 (a: tip, b: gnd) {
				  value 1 MΩ ± 1 %
				  package 0805
				  rated power 250 mW
				}
				""");
		Fix fix = only(fixes(design), "resistor-voltage");
		// 357.8 V (IEC 60038 230 V + 10 % peak) over 0805's 150 V derated to 80 % (120 V): three parts;
		// 1 MΩ / 3 = 333 kΩ, the nearest E24 value 330 kΩ, each 119.3 V [closed form]
		assertTrue(fix.label().startsWith("split R1 into 3 × 330 kΩ in series (119 V each"), fix.label());
		String fixed = fix.applyTo(Files.readString(design));
		assertTrue(fixed.contains("""
				net R1_N1
				net R1_N2

				resistor R1_1 (a: tip, b: R1_N1) {
				  value 330 kΩ ± 1 %
				  package 0805
				  rated power 250 mW
				}
				"""), fixed);
		DesignResult after = CHECKER.check(fixed, design.toString(), CancelIndicator.NullImpl);
		assertTrue(after.findings().stream().noneMatch(f -> f.severity() == bulwark.check.finding.Severity.ERROR),
				after.findings().toString());
	}

	@Test
	void addAMissingPowerRatingThatHolds(@TempDir Path dir) throws Exception {
		Path design = dir.resolve("d.bulwark");
		Files.writeString(design, """
				design "unrated"
				reference net gnd
				net v
				net m
				source V1 (plus: v, minus: gnd) { voltage 12 V }
				resistor R1 (a: v, b: m) { value 100 Ω rated voltage 200 V }
				resistor R2 (a: m, b: gnd) { value 200 Ω package 1206 rated power 1 W }
				""");
		Fix fix = only(fixes(design), "rating-missing");
		// (40 mA)² × 100 Ω = 160 mW; 250 mW derated to 60 % holds 150 mW, too little: 500 mW [closed form]
		assertTrue(fix.label().startsWith("add R1's rated power 500 mW (worst dissipation 160 mW"), fix.label());
		// (with a package and no power rating, the package's usual one is assumed instead: nothing is missing)
		assertTrue(fix.applyTo(Files.readString(design)).contains("rated voltage 200 V\n  rated power 500 mW # added by a quick fix"),
				fix.applyTo(Files.readString(design)));
	}

	/** The continuity input of the hysteresis rule's test, without its feedback resistor. */
	private static final String NO_FEEDBACK = """
			design "continuity input"
			reference net gnd
			net vbat
			net tip
			net plus
			net ref
			net out
			terminal TIP at tip
			terminal COM at gnd common
			battery B1 (plus: vbat, minus: gnd) { emf 3 V }
			resistor R_PULL (a: vbat, b: tip) { value 10 kΩ rated power 250 mW package 0805 }
			resistor R1 (a: tip, b: plus) { value 100 kΩ rated power 250 mW package 0805 }
			resistor R_TOP (a: vbat, b: ref) { value 100 kΩ rated power 250 mW package 0805 }
			resistor R_BOT (a: ref, b: gnd) { value 100 kΩ rated power 250 mW package 0805 }
			comparator U1 (in_plus: plus, in_minus: ref, out: out, supply_plus: vbat, supply_minus: gnd)
			""";

	@Test
	void addHysteresisSizedByTheNetworkFormula(@TempDir Path dir) throws Exception {
		Path design = dir.resolve("d.bulwark");
		Files.writeString(design, NO_FEEDBACK.replace("design \"continuity input\"",
				"design \"continuity input\"\npolicy \"p.bulwark-policy\""));
		Files.writeString(dir.resolve("p.bulwark-policy"), "policy \"p\"\n  mains none\n");
		Fix fix = only(fixes(design), "hysteresis");
		// step = VOH·R1/(R1 + R2) ≥ 2 × 10 mV with VOH = 3 V, R1 = 100 kΩ: R2 ≤ 14.9 MΩ, on E24 13 MΩ, which
		// gives 3·100 k/13.1 M = 22.9 mV [closed form, the non-inverting network of docs/sources.md#solver-oracles]
		assertTrue(fix.label().startsWith("add R_HYST_U1 = 13 MΩ from U1's output to in_plus: about 22.9 mV"), fix.label());
		DesignResult after = CHECKER.check(fix.applyTo(Files.readString(design)), design.toString(), CancelIndicator.NullImpl);
		assertTrue(after.findings().stream().noneMatch(f -> f.rule().text().equals("hysteresis")), after.findings().toString());
	}

	@Test
	void limitAClampCurrentWithTheSmallestResistorThatHolds(@TempDir Path dir) throws Exception {
		Path design = dir.resolve("d.bulwark");
		Files.writeString(design, """
				design "bare input"
				policy "p.bulwark-policy"
				reference net gnd
				net vbat
				net tip
				net ref
				net out
				terminal TIP at tip
				terminal COM at gnd common
				battery B1 (plus: vbat, minus: gnd) { emf 5 V type rechargeable rated charge 1 A }
				resistor R_TOP (a: vbat, b: ref) { value 100 kΩ rated power 250 mW package 0805 }
				resistor R_BOT (a: ref, b: gnd) { value 100 kΩ rated power 250 mW package 0805 }
				resistor R_OUT (a: out, b: gnd) { value 100 kΩ rated power 250 mW package 0805 }
				resistor R_TIP (a: tip, b: gnd) { value 1 MΩ rated power 250 mW package 0805 }
				comparator U1 (in_plus: tip, in_minus: ref, out: out, supply_plus: vbat, supply_minus: gnd)
				""");
		Files.writeString(dir.resolve("p.bulwark-policy"), "policy \"p\"\n  mains none\n  level 24 V\n");
		Fix fix = only(fixes(design), "clamp-current");
		// 24 V on the tip, 5 V rail: about 19 V across the new resistor; 10 kΩ passes about 1.9 mA, within the
		// 10 mA clamp rating, and dissipates 36 mW in its 250 mW [closed form]
		assertEquals("put R_CLAMP_U1 = 10 kΩ in series with U1's in_plus to limit its clamp current", fix.label());
		String fixed = fix.applyTo(Files.readString(design));
		assertTrue(fixed.contains("comparator U1 (in_plus: U1_IN_PLUS,") && fixed.contains("net U1_IN_PLUS"), fixed);
	}

	@Test
	void noFixIsOfferedThatARecheckWouldRefute(@TempDir Path dir) throws Exception {
		Path loom = dir.resolve("loom.bulwark");
		Files.copy(root().resolve("examples/stage-loom-checker.bulwark"), loom);
		Files.createDirectories(dir.resolve("lib"));
		Files.copy(root().resolve("examples/lib/generic-parts.bulwark"), dir.resolve("lib/generic-parts.bulwark"));
		// R_LIMIT dissipates 197 W under mains: no standard power step holds that, so nothing is offered for it
		assertTrue(fixes(loom).entrySet().stream()
				.noneMatch(e -> "R_LIMIT".equals(e.getKey().part()) && e.getKey().rule().text().equals("resistor-power")));
	}

	@Test
	void aLargerPackageOrASplit(@TempDir Path dir) throws Exception {
		Path design = dir.resolve("d.bulwark");
		Files.writeString(design, """
				design "200 V on a chip resistor"
				policy "p.bulwark-policy"
				reference net gnd
				net tip
				terminal TIP at tip
				terminal COM at gnd common
				resistor R1 (a: tip, b: gnd) { value 1 MΩ ± 1 % package 0805 rated power 250 mW }
				case "200 V" { apply 200 V from TIP to COM }
				""");
		Files.writeString(dir.resolve("p.bulwark-policy"), "policy \"p\"\n  mains none\n");
		List<Fix> fixes = fixes(design).entrySet().stream().filter(e -> e.getKey().rule().text().equals("resistor-voltage"))
				.flatMap(e -> e.getValue().stream()).toList();
		// 200 V against 0805's 150 V derated to 80 % (120 V): an axial ¼ W part (250 V → 200 V) holds it exactly;
		// or two parts of 510 kΩ (E24 nearest to 500 kΩ), 100 V each [closed form]
		assertEquals(List.of("move R1 from 0805 to axial quarter (limiting element voltage 150 V → 250 V; 167 % → 100 % of the limit)",
				"split R1 into 2 × 510 kΩ in series (100 V each, 83 % of the limit, was 167 %; total 1.02 MΩ for 1 MΩ)"),
				fixes.stream().map(Fix::label).toList());
	}

	@Test
	void snapAComputedValue(@TempDir Path dir) throws Exception {
		Path design = dir.resolve("d.bulwark");
		Files.writeString(design, """
				design "computed"
				reference net gnd
				net a
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				resistor R1 (a: a, b: gnd) { value 333 kΩ ± 5 % package 0805 rated power 125 mW }
				""");
		Fix fix = only(fixes(design), "preferred-value");
		assertEquals("snap R1 to 330 kΩ", fix.label());
		assertTrue(fix.applyTo(Files.readString(design)).contains("value 330 kΩ ± 5 %"));
	}

	@Test
	void preferredValuesOfIec60063() {
		assertEquals(96, PreferredValues.series(96).length);
		assertArrayEquals(new double[] { 1.0, 1.5, 2.2, 3.3, 4.7, 6.8 }, PreferredValues.series(6), 0);
		// E24 is a table: 2.7, 3.0, 3.3 … 8.2, 9.1 where the formula would give 2.6, 3.2 … 8.3 [docs/sources.md#preferred-values]
		assertEquals(2.7, PreferredValues.series(24)[10], 0);
		assertTrue(java.util.Arrays.stream(PreferredValues.series(192)).anyMatch(v -> v == 9.20));
		assertEquals(1.02, PreferredValues.series(96)[1], 0); // round(100·10^(1/96)) / 100 [closed form]
		assertEquals(330e3, PreferredValues.nearest(333.3e3, 24), 1e-6);
		assertEquals(3.6e3, PreferredValues.atLeast(3.4e3, 24), 1e-9);
	}

	/** The repository's root, where the bundled examples are. */
	private static Path root() {
		return Path.of(System.getProperty("bulwark.root", "../..")).toAbsolutePath().normalize();
	}
}
