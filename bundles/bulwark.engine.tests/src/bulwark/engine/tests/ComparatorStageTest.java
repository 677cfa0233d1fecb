package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;

import org.junit.jupiter.api.Test;

import bulwark.engine.device.ComparatorModel;
import bulwark.engine.device.ComparatorStage;

/**
 * The comparator's output stage is linearised with derivatives taken by hand; each must agree with a
 * central difference of the stage's own currents [numerical differentiation: the central difference's error
 * is O(h²); Burden and Faires, Numerical Analysis, §4.1], in and out of the switching region, sourcing and
 * sinking, push-pull and open drain, with the supplies powered and not.
 */
class ComparatorStageTest {
	private static final ComparatorModel PUSH_PULL = ComparatorModel.GENERIC;
	private static final ComparatorModel OPEN_DRAIN = ComparatorModel.GENERIC.withOpenDrain(true);
	/** A low gain keeps tanh away from saturation over the differences' step, so that they resolve its slope. */
	private static final ComparatorModel SOFT = new ComparatorModel(50, 200, 10e-6, false, ComparatorModel.GENERIC.clamp());
	private static final ComparatorModel SOFT_OPEN_DRAIN = SOFT.withOpenDrain(true);

	/** in+, in−, out, supply+, supply− */
	private static final double[][] POINTS = { { 2.5, 2.5, 2.5, 5, 0 }, { 2.5001, 2.5, 1, 5, 0 }, { 2.4999, 2.5, 4, 5, 0 },
				{ 3, 2, 4.9, 5, 0 }, { 1, 2, 0.2, 5, 0 }, { 0.3, 0.2, 7, 12, -3 }, { 1, 1, 1, 0, 0 },
				{ 0.1, 0, 0.5, 0.0005, 0 }, { 2.5, 2.4, 2.5, 5, 0 }, { -1, 0.5, 2, 3.3, 0 } };

	@Test
	void derivativesAgreeWithCentralDifferences() {
		for (ComparatorModel model : new ComparatorModel[] { PUSH_PULL, OPEN_DRAIN, SOFT, SOFT_OPEN_DRAIN }) {
			for (double[] v : POINTS) {
				check(model, v);
			}
		}
	}

	private static void check(ComparatorModel model, double[] v) {
		ComparatorStage stage = new ComparatorStage(model);
		double[] currents = new double[3];
		double[] jacobian = new double[15];
		stage.evaluate(v, currents, jacobian);
		for (int k = 0; k < 5; k++) {
			// the step stays well inside the tanh's width, 1/a with a = 2·A/span (the span clamped at 1 mV)
			double a = 2 * model.gain() / Math.max(Math.abs(v[3] - v[4]), 1e-3);
			double h = k == ComparatorStage.OUT ? 1e-8 * Math.max(1, Math.abs(v[k]))
					: Math.min(1e-8 * Math.max(1, Math.abs(v[k])), 1e-4 / a);
			double[] up = v.clone(), down = v.clone();
			up[k] += h;
			down[k] -= h;
			double[] iUp = new double[3], iDown = new double[3];
			stage.evaluate(up, iUp, null);
			stage.evaluate(down, iDown, null);
			for (int r = 0; r < 3; r++) {
				double numeric = (iUp[r] - iDown[r]) / (up[k] - down[k]); // the step as represented
				double exact = jacobian[5 * r + k];
				int row = r, pin = k;
				// truncation (relative, the step being small against the curvature) and rounding, ~ε·|i|/h
				double rounding = 1e-15 * (Math.abs(iUp[r]) + Math.abs(iDown[r])) / h;
				double tolerance = 1e-5 * Math.abs(exact) + rounding + 1e-9;
				assertEquals(numeric, exact, tolerance, () -> "∂i[" + row + "]/∂v[" + pin + "] at " + Arrays.toString(v) + " of " + model);
			}
		}
	}
}
