package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;

import org.junit.jupiter.api.Test;

import bulwark.check.DesignResult;
import bulwark.check.function.FunctionFigures;
import bulwark.check.function.PairFigures;

/** Function figures at the terminals against closed forms, each with its source. */
class FunctionFiguresTest {

	/**
	 * A 3 V cell drives a 100 Ω indicator (on from 10 mA) and the resistance under test in series: on while
	 * 3/(100 + Rx) ≥ 10 mA, so below Rx = 200 Ω [closed form, Ohm's law]; 3/100 Ω = 30 mA into a short.
	 */
	private static final String SERIES = """
			design "series indicator"
			reference net gnd
			net cell
			net tip
			terminal TIP at tip
			terminal COM at gnd common
			battery B1 (plus: cell, minus: gnd) { emf 3 V capacity 1000 mAh }
			indicator L1 (a: cell, b: tip) { resistance 100 Ω activation 10 mA rated power 250 mW }
			resistor R_LEAK (a: cell, b: gnd) { value 1 MΩ package 0805 rated power 125 mW }
			""";

	@Test
	void thresholdTestCurrentAndBatteryLifeOfASeriesIndicator() {
		DesignResult r = Fixtures.check(SERIES);
		FunctionFigures f = r.function();
		assertEquals("L1", f.indicator());
		PairFigures p = f.pairs().get(0);
		assertTrue(p.onWhenShorted());
		assertEquals(200, p.thresholdOhms(), 200 * 2e-3); // bisected to 0.1 %
		assertEquals(3 / (100 + 1e-3), p.testCurrentAmps(), 1e-9);
		assertEquals(3, p.openVolts(), 1e-9);
		// standby through the 1 MΩ leak: 3 µA; 1000 mAh / 3 µA = 333 333 h [closed form, capacity / current]
		assertEquals(3e-6, f.standbyAmps(), 1e-12);
		assertEquals(1.0 / 3e-6, f.batteryLifeHours(), 1e-3);
		// with the terminals shorted the cell also feeds the indicator: 30 mA + 3 µA
		assertEquals(3 / (100 + 1e-3) + 3e-6, p.shortedBatteryAmps(), 1e-9);
		// 3 V open: LEDs up to the yellow range's 2.18 V light (about (3 − 2.2)/100 Ω = 8 mA); green, blue,
		// violet and white, up to 3.5–4 V [docs/sources.md#leds], do not [closed form, with each colour's highest voltage]
		assertEquals(java.util.List.of("red", "orange", "yellow"), p.lightsLeds());
	}

	@Test
	void schmittThresholdsRisingAndFallingAgainstTheNetworkEquations() {
		// the continuity input of the hysteresis rule's test: pull-up 10 kΩ from 3 V to the tip, R1 100 kΩ to
		// in_plus, R2 1 MΩ from the output, 1.5 V on in_minus. Thevenin of the tip: Vt = 3·Rx/(Rx + 10 k),
		// Rt = 10 k ∥ Rx. It switches where in_plus crosses 1.5 V: output low, in_plus = Vt·R2/(Rt + R1 + R2);
		// output high (3 V), in_plus = (Vt·R2 + 3·(Rt + R1))/(Rt + R1 + R2) [closed form, superposition]
		String text = Fixtures.replaced(HysteresisRuleTest.SCHMITT, " #! hysteresis", "");
		PairFigures p = Fixtures.check(text).function().pairs().get(0);
		double r1 = 100e3, r2 = 1e6;
		DoubleUnaryOperator vt = rx -> 3 * rx / (rx + 10e3), rt = rx -> 10e3 * rx / (10e3 + rx);
		double rising = root(rx -> vt.applyAsDouble(rx) * r2 / (rt.applyAsDouble(rx) + r1 + r2) - 1.5);
		double falling = root(rx -> (vt.applyAsDouble(rx) * r2 + 3 * (rt.applyAsDouble(rx) + r1))
				/ (rt.applyAsDouble(rx) + r1 + r2) - 1.5);
		assertEquals(rising, p.risingOhms(), rising * 3e-3);
		assertEquals(falling, p.fallingOhms(), falling * 3e-3);
		assertTrue(p.hysteresisOhms() > 0);
	}

	/** Bisection of an increasing function of the resistance over 1 Ω … 1 MΩ, geometric. */
	private static double root(DoubleUnaryOperator f) {
		double lo = 1, hi = 1e6;
		for (int i = 0; i < 200; i++) {
			double mid = Math.sqrt(lo * hi);
			if (f.applyAsDouble(mid) < 0) {
				lo = mid;
			} else {
				hi = mid;
			}
		}
		return Math.sqrt(lo * hi);
	}

	/**
	 * Two switching points each bisected to 0.1 % that differ by less than both widths are one point: the
	 * difference is the bisection's, not hysteresis, and reads as none [closed form: bisection width].
	 */
	@Test
	void switchingPointsWithinTheSweepsResolutionHaveNoHysteresis() {
		var same = new bulwark.check.function.PairFigures("TIP", "COM", true, 100.0, 100.08, 0.01, 5, null,
				java.util.List.of(), java.util.List.of(), java.util.List.of(), null, null);
		assertEquals(0.0, same.hysteresisOhms());
		var apart = new bulwark.check.function.PairFigures("TIP", "COM", true, 100.0, 110.0, 0.01, 5, null,
				java.util.List.of(), java.util.List.of(), java.util.List.of(), null, null);
		assertEquals(10.0, apart.hysteresisOhms(), 1e-12);
	}
}
