package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.RuleId;
import bulwark.check.rules.GateSourceRule;

class GateSourceRuleTest {
	private static final RuleId ID = GateSourceRule.ID;

	/**
	 * A MOSFET's gate reached from the tip through 1 kΩ and held down by 1 MΩ, its source on the reference:
	 * the gate draws no current, so the divider puts 30 V · 1 MΩ / 1.001 MΩ = 29.97 V between gate and
	 * source, over the rated 20 V [closed form].
	 */
	private static final String EXPOSED = """
			design "gate on the tip"
			reference net gnd
			net tip
			net g
			net d
			terminal TIP at tip
			terminal COM at gnd common
			resistor RG (a: tip, b: g) { value 1 kΩ package 2512 rated power 1 W }
			resistor RGS (a: g, b: gnd) { value 1 MΩ package 1206 rated power 250 mW }
			resistor RD (a: d, b: gnd) { value 10 kΩ package 1206 rated power 250 mW }
			nmos M1 (drain: d, gate: g, source: gnd) { rated gate_source 20 V } #! gate-source
			case "30 V on the tip" { apply 30 V from TIP to COM }
			""";

	/** A 15 V zener from gate to source holds the gate below its rating; RG limits its current to 15 mA. */
	private static final String CLAMPED = Fixtures.replaced(Fixtures.replaced(EXPOSED, " #! gate-source", ""),
			"case \"30 V", "zener Z1 (anode: gnd, cathode: g) { breakdown 15 V rated power 1 W }\ncase \"30 V");

	@Test
	void triggersWithTheWholeVoltageOnTheGate() {
		DesignResult r = Fixtures.check(EXPOSED);
		assertEquals(Fixtures.expected(EXPOSED, ID), Fixtures.actual(r, ID));
		Finding f = Fixtures.only(r, ID);
		assertEquals(30 * 1e6 / (1e6 + 1e3), f.value(), 1e-6);
		assertEquals(20, f.limit(), 0);
	}

	@Test
	void silentWhenTheGateIsClamped() {
		DesignResult r = Fixtures.check(CLAMPED);
		Fixtures.assertSilent(r, ID);
	}
}
