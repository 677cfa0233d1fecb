package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;

import bulwark.check.cases.CaseResult;
import bulwark.check.finding.Concern;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.cases.PartStress;
import bulwark.check.Status;

/** The check as a whole: language errors, solver failures and the case figures. */
class DesignCheckerTest {

	@Test
	void syntaxErrorStopsTheCheckWithLocation() {
		DesignResult r = Fixtures.check("""
				design "broken"
				reference net gnd
				resistor R1 (a: gnd b: gnd) { value 1 kΩ }
				""");
		assertEquals(Status.ERROR, r.status());
		Finding f = r.findings().get(0);
		assertEquals(Concern.SYNTAX, f.concern());
		assertEquals(3, f.location().line());
		assertEquals(21, f.location().column()); // at "b", where ',' or ')' was expected
		assertTrue(r.cases().isEmpty());
	}

	@Test
	void unitOfTheWrongQuantityIsAStructureError() {
		DesignResult r = Fixtures.check("""
				design "units"
				reference net gnd
				net a
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				resistor R1 (a: a, b: gnd) { value 1 kV }
				""");
		assertEquals(Status.ERROR, r.status());
		Finding f = r.findings().get(0);
		assertEquals(Concern.STRUCTURE, f.concern());
		assertEquals(5, f.location().line());
		assertTrue(f.message().contains("resistance"), f.message());
	}

	/** A design's language errors come in the order of its text, whichever check of the language found them. */
	@Test
	void languageErrorsComeInTextOrder() {
		DesignResult r = Fixtures.checkAllowingTrouble("""
				design "mistakes"
				reference net gnd
				net tip
				terminal T at tpi
				resistor R1 (a: tip, b: gnd) { value 1 kΩ rated power 1 W package 1206 }
				resistor R2 (a: tip, c: gnd) { value 1 kΩ rated powr 1 W }
				waive "resistor-power" on R3 because "x" by "y" on "2026-12-04"
				""", bulwark.check.policy.DefaultPolicy.POLICY);
		assertEquals(Status.ERROR, r.status());
		java.util.List<Integer> lines = r.findings().stream().map(f -> f.location().line()).toList();
		assertTrue(lines.size() >= 4, r.findings().toString());
		assertEquals(lines.stream().sorted().toList(), lines, r.findings().toString());
	}

	@Test
	void floatingNetIsASolverFindingOnTheNet() {
		DesignResult r = Fixtures.checkAllowingTrouble("""
				design "island"
				reference net gnd
				net a
				net island
				net other
				source V1 (plus: a, minus: gnd) { voltage 5 V }
				resistor R1 (a: a, b: gnd) { value 1 kΩ rated power 1 W }
				resistor R2 (a: island, b: other) { value 1 kΩ rated power 1 W }
				""");
		assertEquals(Status.ERROR, r.status());
		Finding f = r.findings().stream().filter(x -> x.concern() == Concern.SOLVER).findFirst().orElseThrow();
		assertEquals(4, f.location().line());
		assertTrue(f.message().contains("floating net"), f.message());
		assertFalse(r.cases().get(0).converged());
	}

	@Test
	void caseFiguresAreReported() {
		DesignResult r = Fixtures.check("""
				design "divider"
				reference net gnd
				net in
				net out
				source V1 (plus: in, minus: gnd) { voltage 12 V }
				resistor R1 (a: in, b: out) { value 10 kΩ rated power 250 mW }
				resistor R2 (a: out, b: gnd) { value 20 kΩ rated power 250 mW rated voltage 5 V }
				""");
		CaseResult normal = r.cases().get(0);
		assertTrue(normal.converged());
		PartStress r2 = normal.parts().stream().filter(p -> p.part().equals("R2")).findFirst().orElseThrow();
		// Divider 12 V, 10 k over 20 k: 8 V [closed form: the voltage divider]; 8 V over a 5 V rating limits before power
		assertEquals(8.0, r2.voltage(), 1e-12);
		assertEquals(8.0 / 5.0, r2.utilisation(), 1e-12);
		assertEquals("voltage", r2.limiting());
		PartStress v1 = normal.parts().stream().filter(p -> p.part().equals("V1")).findFirst().orElseThrow();
		assertEquals(-12.0 / 30e3, v1.current(), 1e-15); // delivering: current leaves the plus pin
	}

	@Test
	void unreadableFileIsNotChecked() {
		DesignResult r = Fixtures.checker().check(Path.of("no/such/file.bulwark"));
		assertEquals(Status.ERROR, r.status());
		assertTrue(r.findings().get(0).message().startsWith("cannot read the file"));
	}
}
