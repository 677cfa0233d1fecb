package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import bulwark.check.cases.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.cases.PartStress;
import bulwark.check.Status;
import bulwark.check.rules.ResistorPowerRule;

/** The designer's own cases: voltages, resistances and shorts at the terminals, solved besides the normal one. */
class DesignerCasesTest {
	private static final String INPUT = """
			design "input"
			reference net gnd
			net tip
			net sense
			terminal TIP "probe tip" at tip
			terminal COM "common" at gnd common
			resistor R1 (a: tip, b: sense) { value 100 kΩ rated power 250 mW }
			resistor R2 (a: sense, b: gnd) { value 10 kΩ rated power 125 mW }
			case "mains peak on the tip" { apply 357.8 V from TIP to COM }
			case "reversed" { apply 357.8 V behind 2 Ω from COM to TIP }
			case "tip shorted" { short TIP to COM }
			case "100 ohm across" { connect 100 Ω from TIP to COM }
			""";

	private static PartStress part(CaseResult c, String name) {
		return c.parts().stream().filter(p -> p.part().equals(name)).findFirst().orElseThrow();
	}

	@Test
	void everyCaseIsSolvedInOrder() {
		DesignResult r = Fixtures.check(INPUT);
		List<String> names = r.cases().stream().map(CaseResult::name).toList();
		// the normal conditions first (open, then each terminal shorted to the common one), then the designer's
		assertEquals(List.of("normal, terminals open", "normal, TIP shorted to COM", "mains peak on the tip", "reversed",
				"tip shorted", "100 ohm across"), names);
		assertTrue(r.cases().stream().allMatch(CaseResult::converged));
		// 357.8 V across 110 kΩ: 3.2527 mA; R1 takes 100/110 of it [closed form, divider]
		double i = 357.8 / 110e3;
		assertEquals(357.8 * 100 / 110, part(r.cases().get(2), "R1").voltage(), 1e-9);
		assertEquals(i * i * 100e3, part(r.cases().get(2), "R1").power(), 1e-12);
		// reversed behind 2 Ω: the source resistance takes 2/110002 of the voltage
		assertEquals(-357.8 * 100e3 / 110002, part(r.cases().get(3), "R1").voltage(), 1e-9);
		assertEquals(0, part(r.cases().get(4), "R1").current(), 1e-15);
	}

	@Test
	void powerFindingNamesTheWorstCase() {
		// R1 100 kΩ 250 mW takes (357.8·100/110)² / 100 kΩ = 1.058 W at mains peak: the finding names that case
		DesignResult r = Fixtures.check(INPUT);
		Finding f = Fixtures.only(r, ResistorPowerRule.ID);
		assertEquals("R1", f.part());
		assertEquals("mains peak on the tip", f.caseName());
		assertEquals(Math.pow(357.8 * 100 / 110, 2) / 100e3, f.value(), 1e-9);
		assertEquals(Status.FAIL, r.status());
	}

	@Test
	void aCaseThatCannotBeSolvedIsFoundOnItsLine() {
		// two wires across the same terminals form a loop of ideal sources: the solver names the case's device
		DesignResult r = Fixtures.checkAllowingTrouble(INPUT + "case \"double short\" { short TIP to COM short COM to TIP }\n");
		assertEquals(Status.ERROR, r.status());
		Finding f = r.findings().stream().filter(x -> x.rule().text().equals("solver")).findFirst().orElseThrow();
		assertEquals("double short", f.caseName());
		assertEquals(INPUT.split("\n").length + 1, f.location().line());
		assertTrue(f.message().contains("voltage source loop"), f.message());
	}

	@Test
	void caseMistakesAreLanguageErrors() {
		DesignResult r = Fixtures.check(Fixtures.replaced(Fixtures.replaced(INPUT, "apply 357.8 V from TIP", "apply 357.8 Ω from TIP"), "short TIP to COM", "short TIP to TIP"));
		assertEquals(Status.ERROR, r.status());
		assertTrue(r.findings().stream().anyMatch(f -> f.message().contains("apply takes a voltage")), r.findings().toString());
		assertTrue(r.findings().stream().anyMatch(f -> f.message().contains("two different terminals")));
	}
}
