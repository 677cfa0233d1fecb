package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import bulwark.check.load.LoadedDesign;
import bulwark.check.tolerance.Corners;
import bulwark.check.tolerance.MonteCarlo;
import bulwark.check.tolerance.Progress;
import bulwark.check.tolerance.Statistics;
import bulwark.check.tolerance.ToleranceAnalysis;
import bulwark.check.tolerance.Toleranced;
import bulwark.check.tolerance.Yield;
import bulwark.lang.design.Design;
import bulwark.check.policy.Distribution;

/** Corners and Monte Carlo against closed forms, reproducibility and yields. */
class ToleranceAnalysisTest {
	/** A 9 V cell (1.7 Ω) behind 680 Ω ± 5 % to the core; a 100 kΩ ± 1 % over 47 kΩ ± 1 % read-back. */
	private static final String CHECKER = """
			design "loom checker"
			reference net gnd
			net bat
			net probe
			net readback
			terminal CORE at probe
			terminal SCREEN at gnd common
			battery B1 (plus: bat, minus: gnd) { emf 9 V resistance 1.7 Ω capacity 500 mAh }
			resistor R_LIMIT (a: bat, b: probe) { value 680 Ω ± 5 % package 1206 rated power 250 mW }
			resistor R_READ (a: probe, b: readback) { value 100 kΩ ± 1 % package 0805 rated power 125 mW }
			resistor R_LOAD (a: readback, b: gnd) { value 47 kΩ ± 1 % package 0805 rated power 125 mW }
			require battery_life 8000 h
			require test_current 13.5 mA
			""";

	private static Design design() {
		LoadedDesign loaded = Fixtures.loader().load(CHECKER, "checker.bulwark", null);
		return loaded.design();
	}

	private static ToleranceAnalysis.Result run(int samples, long seed, Distribution d) {
		return ToleranceAnalysis.run(design(), Fixtures.AS_WRITTEN, samples, seed, d, Progress.NONE);
	}

	private static Corners.Range corner(ToleranceAnalysis.Result r, String figure) {
		return r.corners().ranges().stream().filter(c -> c.figure().name().equals(figure)).findFirst().orElseThrow();
	}

	@Test
	void everyTolerancedParameterIsFound() {
		assertEquals(List.of(new Toleranced("R_LIMIT", "value", 0.05), new Toleranced("R_READ", "value", 0.01),
				new Toleranced("R_LOAD", "value", 0.01)), Toleranced.of(design()));
	}

	@Test
	void cornersOfTheTestCurrentAndBatteryLife() {
		ToleranceAnalysis.Result r = run(0, 1, Distribution.UNIFORM);
		// into a short only R_LIMIT matters: 9/(1.7 + 680·1.05) and 9/(1.7 + 680·0.95), the 1 mΩ short beside
		// [closed form, Ohm's law]
		Corners.Range test = corner(r, "test current CORE–SCREEN");
		assertEquals(9 / (1.7 + 714 + 1e-3), test.low(), 1e-8);
		assertEquals(9 / (1.7 + 646 + 1e-3), test.high(), 1e-8);
		// idle, the whole string: 1800 C over 9/(1.7 + R_LIMIT + R_READ + R_LOAD), in hours, at both extremes
		Corners.Range life = corner(r, "battery life");
		assertEquals(1800 / (9 / (1.7 + 646 + 99e3 + 46.53e3)) / 3600, life.low(), 1e-6);
		assertEquals(1800 / (9 / (1.7 + 714 + 101e3 + 47.47e3)) / 3600, life.high(), 1e-6);
	}

	@Test
	void monteCarloIsReproducibleAndInsideTheCorners() {
		ToleranceAnalysis.Result a = run(200, 42, Distribution.UNIFORM);
		ToleranceAnalysis.Result b = run(200, 42, Distribution.UNIFORM);
		ToleranceAnalysis.Result c = run(200, 43, Distribution.UNIFORM);
		assertEquals(a.statistics(), b.statistics(), "the same seed gives the same run, whatever the threads");
		assertNotEquals(a.statistics(), c.statistics());
		for (Statistics s : a.statistics()) {
			Corners.Range range = corner(a, s.figure().name());
			assertTrue(s.min() >= range.low() * (1 - 1e-9) && s.max() <= range.high() * (1 + 1e-9),
					s + " outside " + range);
		}
	}

	@Test
	void yieldsCountTheSamplesThatMeetEachRequirement() {
		ToleranceAnalysis.Result r = run(300, 7, Distribution.UNIFORM);
		Yield life = r.yields().get(0), test = r.yields().get(1);
		assertEquals(300, life.met(), life.toString()); // the corners' low life, 8121 h, still exceeds 8000 h
		// test current ≤ 13.5 mA ⇔ R_LIMIT ≥ 9/13.5 mA − 1.7 Ω = 664.97 Ω: uniform over 646…714 Ω, a share of
		// (714 − 664.97)/68 = 72.1 % [closed form]; 300 samples bound it within a few binomial σ (2.6 %)
		double expected = (714 - (9 / 13.5e-3 - 1.7 - 1e-3)) / 68;
		assertEquals(expected, test.fraction(), 4 * Math.sqrt(expected * (1 - expected) / 300), test.toString());
	}

	@Test
	void normalSamplesHaveThreeSigmaAtTheTolerance() {
		List<Toleranced> one = List.of(new Toleranced("R", "value", 0.03));
		double sum = 0, squares = 0, extreme = 0;
		int n = 20000;
		for (int i = 0; i < n; i++) {
			Map<String, Double> f = MonteCarlo.draw(one, 5, i, Distribution.NORMAL);
			double x = f.get("R.value") - 1;
			sum += x;
			squares += x * x;
			extreme = Math.max(extreme, Math.abs(x));
		}
		double sigma = Math.sqrt(squares / n - (sum / n) * (sum / n));
		assertEquals(0.01, sigma, 0.0003); // 3σ = 3 %, sampling error of σ ≈ σ/√(2n) = 0.5 %
		assertTrue(extreme <= 0.03 + 1e-15, "cut at the tolerance: " + extreme);
	}
}
