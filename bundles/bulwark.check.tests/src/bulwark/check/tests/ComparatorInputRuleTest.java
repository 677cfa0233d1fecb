package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.rules.ComparatorInputRule;
import bulwark.check.finding.RuleId;

class ComparatorInputRuleTest {
	private static final RuleId ID = ComparatorInputRule.ID;

	/**
	 * 24 V on the probe tip into in+ through 100 kΩ; the input clamps to the 5 V rail about 0.5 V above it
	 * (a silicon junction at ~0.2 mA), over the assumed 0.3 V CMOS margin. RPD holds the input low while the
	 * tip is open, as any real input needs (without it see {@link #anInputHeldOnlyByLeakageIsNamed}).
	 */
	static final String EXPOSED = """
			design "comparator on the tip"
			reference net gnd
			net vcc
			net tip
			net inp
			net ref
			net out
			terminal TIP at tip
			terminal COM at gnd common
			source VCC (plus: vcc, minus: gnd) { voltage 5 V resistance 1 Ω }
			source VREF (plus: ref, minus: gnd) { voltage 2.5 V }
			resistor RIN (a: tip, b: inp) { value 100 kΩ rated power 250 mW }
			resistor RPD (a: inp, b: gnd) { value 1 MΩ rated power 125 mW }
			resistor RL (a: out, b: gnd) { value 10 kΩ rated power 125 mW }
			comparator U1 (in_plus: inp, in_minus: ref, out: out, supply_plus: vcc, supply_minus: gnd) #! comparator-input
			case "24 V on the tip" { apply 24 V from TIP to COM }
			""";

	@Test
	void triggersWhenTheInputClampsToItsRail() {
		DesignResult r = Fixtures.check(EXPOSED);
		assertEquals(Fixtures.expected(EXPOSED, ID), Fixtures.actual(r, ID));
		double beyond = Fixtures.only(r, ID).value();
		assertTrue(beyond > 0.3 && beyond < 0.8, "input beyond the rail by " + beyond);
	}

	@Test
	void silentWithinTheRails() {
		String safe = Fixtures.replaced(Fixtures.replaced(EXPOSED, "apply 24 V", "apply 4 V"), " #! comparator-input", "");
		DesignResult r = Fixtures.check(safe);
		assertEquals(Fixtures.expected(safe, ID), Fixtures.actual(r, ID));
		Fixtures.assertSilent(r, ID);
	}

	@Test
	void anInputHeldOnlyByLeakageIsNamed() {
		// with the tip open and no RPD, inp (and tip behind RIN) is held by picoamperes of clamp leakage, and
		// the comparator's gain of 1e5 turns that into an undefined output: the case cannot be solved, and the
		// failure names the input net and what would hold it, not where the factorisation broke
		String floating = Fixtures.replaced(EXPOSED, "resistor RPD (a: inp, b: gnd) { value 1 MΩ rated power 125 mW }\n", "");
		DesignResult r = Fixtures.checkAllowingTrouble(floating);
		var solver = r.findings().stream().filter(f -> f.rule().text().equals("solver")).findFirst().orElseThrow();
		assertTrue(solver.message().contains("net inp, tip is held only by the input leakage of U1"), solver.message());
		assertTrue(solver.message().contains("hold it with a resistor"), solver.message());
		assertEquals("case 'normal, terminals open' could not be solved (floating net): net inp, tip is held only by "
				+ "the input leakage of U1: its voltage, and so what those inputs decide, is undefined; hold it with a "
				+ "resistor to the reference or a rail", solver.message());
		assertEquals(5, solver.location().line()); // net inp
	}
}
