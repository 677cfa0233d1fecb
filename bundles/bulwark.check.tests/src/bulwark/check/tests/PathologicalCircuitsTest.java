package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;

import org.eclipse.xtext.util.CancelIndicator;
import org.junit.jupiter.api.Test;

import bulwark.check.finding.Concern;
import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.Status;

/**
 * Circuits that break naive solvers end in a located finding or a solved result — never a silent pass,
 * never an exception, never a hang — and a check that runs over its time budget is reported as not checked.
 */
class PathologicalCircuitsTest {
	private static final String HEAD = "design \"p\"\nreference net gnd\nnet a\nnet b\n";

	/** Checks under the built-in policy, trouble included: these circuits are meant to trouble the solver. */
	private static DesignResult check(String body) {
		return Fixtures.checkAllowingTrouble(HEAD + body, bulwark.check.policy.DefaultPolicy.POLICY);
	}

	/** The check as a solved design must end: no trouble of any kind. */
	private static DesignResult checkSolved(String body) {
		return Fixtures.untroubled(check(body));
	}

	private static Finding solverFinding(DesignResult r) {
		return r.findings().stream().filter(f -> f.rule().text().equals("solver")).findFirst()
				.orElseThrow(() -> new AssertionError("no solver finding: " + r.findings()));
	}

	private static boolean has(DesignResult r, Concern concern, String text) {
		return r.findings().stream().anyMatch(f -> f.concern() == concern && f.message().contains(text)
				&& f.location().line() > 0);
	}

	@Test
	void aFloatingNetIsNamedAndTheDesignIsNotChecked() {
		DesignResult r = check("""
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				resistor R1 (a: a, b: gnd) { value 1 kΩ package 0805 rated power 125 mW }
				net c
				net d
				resistor R2 (a: c, b: d) { value 1 kΩ package 0805 rated power 125 mW }
				resistor R3 (a: d, b: c) { value 2 kΩ package 0805 rated power 125 mW }
				""");
		assertEquals(Status.ERROR, r.status());
		assertTrue(has(r, Concern.SOLVER, "floating"), r.findings().toString());
		// the net is named in the message and the finding sits on its declaration (line 7: "net c")
		Finding f = solverFinding(r);
		assertTrue(f.message().contains("(floating net): net c, d has no DC path to the reference net gnd"), f.message());
		assertEquals(7, f.location().line());
	}

	@Test
	void aLoopOfIdealSourcesIsNamed() {
		DesignResult r = check("""
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				source V2 (plus: a, minus: gnd) { voltage 6 V }
				""");
		assertEquals(Status.ERROR, r.status());
		assertTrue(has(r, Concern.SOLVER, "loop"), r.findings().toString());
		// the source that closes the loop is named, and the finding sits on its line
		Finding f = solverFinding(r);
		assertTrue(f.message().contains("(voltage source loop): V2 closes a loop of ideal voltage sources between nets a and gnd"),
				f.message());
		assertEquals("V2", f.part());
		assertEquals(6, f.location().line());
	}

	private static void assertAllLocated(DesignResult r) {
		for (Finding f : r.findings()) {
			assertTrue(f.location().line() > 0, "unlocated: " + f);
		}
	}

	@Test
	void aGeneratedShortAcrossAnIdealSourceStillSolves() {
		// the normal condition shorts TIN to TRET, across an ideal source: through 1 mΩ, not an ideal short,
		// so no loop of ideal sources of the check's own making; 5 V / 1 mΩ = 5 kA in the short [closed form]
		DesignResult r = check("""
				terminal TIN "in" at a
				terminal TRET "return" at gnd common
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				resistor R1 (a: a, b: gnd) { value 1 kΩ package 0805 rated power 125 mW }
				""");
		assertAllLocated(r);
		// mains across the same terminals still meets V1 head on, as the design models it: said so, with the cure
		assertTrue(r.findings().stream().filter(f -> f.rule().text().equals("solver")).allMatch(f -> f.message()
				.contains("mains") && f.message().endsWith("V1 holds those terminals as an ideal source, and the case "
						+ "applies another across them: give it its internal resistance (for example resistance 1 Ω)")),
				r.findings().toString());
		var shorted = r.cases().stream().filter(c -> c.name().equals("normal, TIN shorted to TRET")).findFirst().orElseThrow();
		assertTrue(shorted.converged());
		double v1 = shorted.parts().stream().filter(p -> p.part().equals("V1")).findFirst().orElseThrow().current();
		assertEquals(5 / 1e-3, Math.abs(v1), 5 / 1e-3 * 1e-3);
	}

	@Test
	void aLoopOfPicoOhmPartsIsLocated() {
		DesignResult r = check("""
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				resistor R1 (a: a, b: b) { value 1 pΩ package 0805 rated power 125 mW }
				resistor R2 (a: b, b: a) { value 1 pΩ package 0805 rated power 125 mW }
				resistor R3 (a: b, b: gnd) { value 1 kΩ package 0805 rated power 125 mW }
				""");
		assertAllLocated(r);
	}

	@Test
	void aZeroOhmPartIsALocatedError() {
		DesignResult r = check("resistor R1 (a: a, b: gnd) { value 0 Ω }\n");
		assertEquals(Status.ERROR, r.status());
		Finding f = r.findings().stream().filter(x -> x.message().contains("more than zero")).findFirst().orElseThrow();
		assertEquals(5, f.location().line());
	}

	@Test
	void extremeValuesSolve() {
		DesignResult r = checkSolved("""
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				resistor R_HUGE (a: a, b: b) { value 1 TΩ package 0805 rated power 125 mW }
				resistor R_TINY (a: b, b: gnd) { value 1 mΩ package 0805 rated power 125 mW }
				capacitor C_TINY (a: a, b: gnd) { value 0.000001 pF rated voltage 50 V }
				""");
		assertTrue(r.status().passes(), r.findings().toString()); // solved, no error: ratings left out on purpose
		// 5 V over 1 TΩ: 5 pA [closed form]
		double current = r.cases().get(0).parts().stream().filter(p -> p.part().equals("R_HUGE")).findFirst().orElseThrow()
				.current();
		assertEquals(5e-12, current, 1e-18);
	}

	@Test
	void thousandsOfPartsOnOneNetSolve() {
		StringBuilder body = new StringBuilder("source V1 (plus: a, minus: gnd) { voltage 5 V resistance 1 Ω }\n");
		for (int i = 0; i < 3000; i++) {
			body.append("resistor R").append(i).append(" (a: a, b: gnd) { value 3 MΩ package 0805 rated power 125 mW }\n");
		}
		DesignResult r = checkSolved(body.toString());
		assertTrue(r.status().passes(), r.findings().toString()); // solved, no error: ratings left out on purpose
		// 3000 × 3 MΩ in parallel is 1 kΩ behind 1 Ω: each carries 5/(1001)/3000 [closed form]
		double current = r.cases().get(0).parts().stream().filter(p -> p.part().equals("R17")).findFirst().orElseThrow()
				.current();
		assertEquals(5.0 / 1001 / 3000, current, 1e-15);
	}

	@Test
	void aPartConnectedToItselfIsALocatedWarning() {
		DesignResult r = check("""
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				resistor R1 (a: a, b: a) { value 1 kΩ package 0805 rated power 125 mW }
				resistor R2 (a: a, b: gnd) { value 1 kΩ package 0805 rated power 125 mW }
				""");
		Finding f = r.findings().stream().filter(x -> x.message().contains("both pins on net 'a'")).findFirst().orElseThrow();
		assertEquals(Severity.WARNING, f.severity());
		assertEquals(6, f.location().line());
	}

	@Test
	void aCheckOverItsBudgetIsNotChecked() {
		DesignChecker hurried = new DesignChecker(Fixtures.loader(), null, Duration.ZERO);
		DesignResult r = hurried.check(HEAD + "source V1 (plus: a, minus: gnd) { voltage 5 V }\n"
				+ "resistor R1 (a: a, b: gnd) { value 1 kΩ package 0805 rated power 125 mW }\n", "p.bulwark",
				CancelIndicator.NullImpl);
		assertEquals(Status.ERROR, r.status());
		Finding f = r.findings().get(0);
		assertEquals("budget", f.rule().text());
		assertEquals(Concern.SOLVER, f.concern());
		assertTrue(f.message().startsWith("not checked: the check took longer than its budget"), f.message());
		assertEquals(1, f.location().line(), "on the design's title, not at 0:0");
		// reading the text counts against the budget too: a text that takes it all to parse and validate is
		// stopped there, not checked for a budget's time more
		assertTrue(f.message().contains("reading the design"), f.message());
	}
}
