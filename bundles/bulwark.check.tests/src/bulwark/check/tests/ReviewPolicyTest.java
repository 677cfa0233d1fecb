package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import bulwark.check.cases.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.Status;
import bulwark.check.policy.DefaultPolicy;
import bulwark.check.policy.PolicyFiles;
import bulwark.check.policy.ReviewPolicy;
import bulwark.lang.design.PartKind;
import bulwark.check.rules.ResistorPowerRule;
import bulwark.check.rules.RatingMissingRule;

/** The review policy: its language, how it resolves over the built-in one, and what it changes in a check. */
class ReviewPolicyTest {
	private static final String POLICY = """
			policy "field instruments"
			  mains 230 V ± 10 %
			  level 48 V
			  derate resistor power to 50 %
			  minimum hysteresis 20 mV
			  severity "rating-missing" error
			  waivers need name
			""";

	/** One resistor across two terminals, rated 1 W (0805, 150 V limiting element voltage). */
	private static final String ACROSS = """
			design "one resistor across"
			reference net gnd
			net tip
			terminal TIP at tip
			terminal COM at gnd common
			resistor R1 (a: tip, b: gnd) { value 100 kΩ package 0805 rated power 1 W }
			""";

	@Test
	void policyResolvesOverTheBuiltInOne() {
		ReviewPolicy p = Fixtures.policy(POLICY);
		assertEquals("field instruments", p.title());
		assertEquals(1, p.mains().size());
		// IEC 60038: 230 V + 10 % = 253 V RMS, peak 253·√2 = 357.80 V [published + closed form, docs/sources.md#mains-and-surges]
		assertEquals(357.80, p.mains().get(0).peakVolts(), 0.005);
		assertEquals(List.of(48.0), p.levels());
		assertEquals(0.5, p.derating(PartKind.RESISTOR, "power").factor(), 0);
		// not named in the file: the built-in NASA EEE-INST-002 figure stays
		assertEquals(0.8, p.derating(PartKind.RESISTOR, "voltage").factor(), 0);
		assertEquals(0.02, p.minimumHysteresisVolts().orElseThrow(), 1e-15);
		assertEquals(Severity.ERROR, p.severity(RatingMissingRule.ID, Severity.WARNING));
		assertTrue(p.waiverNeedsName());
		assertFalse(p.waiverNeedsJustification());
	}

	@Test
	void builtInMainsAreTheIec60038PeaksWithTolerance() {
		// 230 V and 120 V, +10 %: 357.8 V and 186.7 V peak [published + closed form, docs/sources.md#mains-and-surges]
		assertEquals(253 * Math.sqrt(2), DefaultPolicy.MAINS.get(0).peakVolts(), 1e-9);
		assertEquals(132 * Math.sqrt(2), DefaultPolicy.MAINS.get(1).peakVolts(), 1e-9);
		assertEquals(186.68, DefaultPolicy.MAINS.get(1).peakVolts(), 0.005);
	}

	@Test
	void aSeverityForAnUnknownRuleIsALocatedError() {
		PolicyFiles.Resolution r = new PolicyFiles(Fixtures.loader(), bulwark.check.rules.RuleRegistry.ids()).parse("""
				policy "typo"
				  severity "resistor-powr" info
				""", "team.bulwark-policy");
		assertTrue(r.policy().isEmpty());
		assertTrue(r.problems().get(0).message().startsWith("review policy team.bulwark-policy:2:12: "),
				r.problems().toString());
		assertTrue(r.problems().get(0).message().contains("(did you mean 'resistor-power'?)"), r.problems().toString());
	}

	/** Every mistake of a policy at once, each once: an unknown rule beside the language's own errors. */
	@Test
	void anUnknownRuleIsReportedWithTheOtherMistakes() {
		PolicyFiles.Resolution r = new PolicyFiles(Fixtures.loader(), bulwark.check.rules.RuleRegistry.ids()).parse("""
				policy "typos"
				  derate resistor powr to 50 %
				  severity "resistor-powr" error
				  mains 230 A
				""", "typos.bulwark-policy");
		List<String> lines = r.problems().stream().map(Finding::message).map(m -> m.substring(0, m.indexOf(": ") + 1)).toList();
		assertEquals(List.of("review policy typos.bulwark-policy:2:19:", "review policy typos.bulwark-policy:3:12:",
				"review policy typos.bulwark-policy:4:9:"), lines.stream().sorted().toList(), r.problems().toString());
	}

	@Test
	void policyLanguageErrorsAreLocated() {
		PolicyFiles.Resolution r = new PolicyFiles(Fixtures.loader(), bulwark.check.rules.RuleRegistry.ids()).parse("""
				policy "wrong"
				  derate resistor reverse to 150 %
				  severity "hysteresis" off
				  mains 230 A
				""", "bad.bulwark-policy");
		String all = r.problems().toString();
		assertTrue(r.policy().isEmpty());
		assertTrue(all.contains("bad.bulwark-policy:2:") && all.contains("has no rating 'reverse'"), all);
		assertTrue(all.contains("at most 100 %"), all);
		assertTrue(all.contains("bad.bulwark-policy:3:") && all.contains("never switched off"), all);
		assertTrue(all.contains("bad.bulwark-policy:4:") && all.contains("takes a voltage"), all);
	}

	@Test
	void aMainsSystemMayNameItsFrequency() {
		ReviewPolicy p = Fixtures.policy("""
				policy "export"
				  mains 230 V ± 10 % 60 Hz
				  mains 120 V ± 10 %
				""");
		assertEquals(60, p.mains().get(0).hertz(), 0);
		assertEquals(60, p.mains().get(1).hertz(), 0); // unnamed: the frequency of 120 V systems (IEC 60038)
		DesignResult r = Fixtures.check(ACROSS, p);
		assertTrue(r.cases().stream().anyMatch(c -> c.name().startsWith("230 V 60 Hz mains (358 V peak)")),
				r.cases().toString());
		PolicyFiles.Resolution wrong = new PolicyFiles(Fixtures.loader(), bulwark.check.rules.RuleRegistry.ids()).parse("policy \"x\"\n  mains 230 V 50 V\n",
				"wrong.bulwark-policy");
		assertTrue(wrong.problems().toString().contains("the mains frequency takes a frequency (Hz), not a voltage"),
				wrong.problems().toString());
	}

	@Test
	void everyPairOfTerminalsGetsEveryMainsSystemOverItsCycle() {
		DesignResult r = Fixtures.checkUnderDefault(ACROSS);
		List<String> names = r.cases().stream().map(CaseResult::name).toList();
		// a resistor has no memory: each system is swept over its cycle, and the crest is where its voltage
		// peaks — 5 ms into a 50 Hz cycle, 4.17 ms into a 60 Hz one (IEC 60038 frequencies); then the cycle as a
		// whole, which carries the average powers
		assertEquals(List.of("normal, terminals open", "normal, TIP shorted to COM",
				"230 V 50 Hz mains (358 V peak), COM + to TIP −, at 5 ms", "230 V 50 Hz mains (358 V peak), between COM and TIP",
				"120 V 60 Hz mains (187 V peak), COM + to TIP −, at 4.17 ms",
				"120 V 60 Hz mains (187 V peak), between COM and TIP"), names);
		// the resistor is straight across the terminals: it sees 357.8 V and 186.7 V [closed form]
		assertEquals(-253 * Math.sqrt(2), voltage(r, 2), 1e-6);
		assertEquals(-132 * Math.sqrt(2), voltage(r, 4), 1e-6);
		// power is thermal: V_rms²/R = 253²/100 kΩ = 0.640 W over the cycle (not 1.28 W at the crest), over
		// 1 W derated to 60 % = 0.6 W (NASA EEE-INST-002) [closed form]
		Finding power = Fixtures.only(r, ResistorPowerRule.ID);
		assertEquals(253 * 253 / 100e3, power.value(), 1e-9);
		assertEquals(0.6, power.limit(), 1e-12);
		assertTrue(power.message().contains("average power over the cycle 640 mW in case '230 V 50 Hz mains (358 V peak), between COM and TIP'"),
				power.message());
		assertTrue(power.message().contains("its rated 1 W derated to 60 % (600 mW)"), power.message());
	}

	@Test
	void aReversedBatteryIsACase() {
		String text = """
				design "cell"
				reference net gnd
				net vbat
				battery B1 (plus: vbat, minus: gnd) { emf 9 V type rechargeable rated charge 100 mA }
				resistor R1 (a: vbat, b: gnd) { value 1 kΩ package 0805 rated power 250 mW }
				""";
		DesignResult r = Fixtures.checkUnderDefault(text);
		CaseResult reversed = r.cases().stream().filter(c -> c.name().equals("battery B1 reversed")).findFirst()
				.orElseThrow();
		assertEquals(-9, reversed.parts().stream().filter(p -> p.part().equals("R1")).findFirst().orElseThrow().voltage(),
				1e-12);
	}

	@Test
	void severityChangesApply() {
		String unrated = Fixtures.replaced(ACROSS, " package 0805 rated power 1 W", "");
		DesignResult r = Fixtures.check(unrated, Fixtures.policy(POLICY));
		assertEquals(Severity.ERROR, Fixtures.only(r, RatingMissingRule.ID).severity());
		assertEquals(Status.FAIL, r.status());
	}

	@Test
	void waiversMissWhatThePolicyNeeds() {
		String waived = ACROSS + "waive \"resistor-power\" on R1 because \"\" by \"J. Okafor\" on \"2026-11-30\"\n";
		// the built-in policy needs a justification: the waiver is not applied and says why
		DesignResult strict = Fixtures.checkUnderDefault(waived);
		assertTrue(strict.findings().stream().anyMatch(f -> f.rule().text().equals("waiver") && f.severity() == Severity.ERROR
				&& f.message().contains("needs a justification")), strict.findings().toString());
		assertFalse(Fixtures.only(strict, ResistorPowerRule.ID).waived());
		// a policy that needs only a name accepts it
		DesignResult lenient = Fixtures.check(waived, Fixtures.policy(Fixtures.replaced(POLICY, "derate resistor power to 50 %", "")));
		assertTrue(Fixtures.only(lenient, ResistorPowerRule.ID).waived(), lenient.findings().toString());
	}

	@Test
	void aDesignUsesThePolicyItNames(@TempDir Path dir) throws IOException {
		Files.writeString(dir.resolve("team.bulwark-policy"), "policy \"team\"\n  mains none\n  level 12 V\n");
		Path design = dir.resolve("d.bulwark");
		Files.writeString(design, Fixtures.replaced(ACROSS, "design \"one resistor across\"", "design \"one resistor across\"\npolicy \"team.bulwark-policy\""));
		DesignResult r = Fixtures.defaultChecker().check(design);
		assertEquals("team", r.policy());
		assertEquals(4, r.cases().size(), r.cases().toString()); // open, shorted, 12 V both ways
	}

	@Test
	void aPolicyOutsideTheDesignFolderIsRefused(@TempDir Path dir) throws IOException {
		Path sub = Files.createDirectories(dir.resolve("designs"));
		Files.writeString(dir.resolve("x.bulwark-policy"), "policy \"outside\"\n");
		Path design = sub.resolve("d.bulwark");
		Files.writeString(design, Fixtures.replaced(ACROSS, "design \"one resistor across\"", "design \"one resistor across\"\npolicy \"../x.bulwark-policy\""));
		DesignResult r = Fixtures.defaultChecker().check(design);
		assertEquals(Status.ERROR, r.status());
		assertTrue(r.findings().get(0).message().contains("must be in the design's folder"), r.findings().toString());
		assertEquals(2, r.findings().get(0).location().line());
	}

	private static double voltage(DesignResult r, int caseIndex) {
		return r.cases().get(caseIndex).parts().stream().filter(p -> p.part().equals("R1")).findFirst().orElseThrow()
				.voltage();
	}
}
