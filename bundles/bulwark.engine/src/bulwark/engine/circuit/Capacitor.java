package bulwark.engine.circuit;

import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;
import bulwark.engine.mna.TransientStep;

/**
 * A capacitor: open in an operating point; in a transient, its companion model for the step h,
 * i = geq·v − (geq·vₙ + iₙ) with geq = 2C/h by the trapezoidal rule, or i = (C/h)·(v − vₙ) by backward
 * Euler (Nagel, ERL memo M520, 1975, §3; any circuit-simulation text).
 */
public final class Capacitor extends TwoTerminal {
	private final double farads;

	public Capacitor(String name, int a, int b, double farads) {
		super(name, a, b);
		if (!(farads > 0) || Double.isInfinite(farads)) {
			throw new IllegalArgumentException(name + ": capacitance must be positive and finite");
		}
		this.farads = farads;
	}

	public double farads() {
		return farads;
	}

	@Override
	public String[] pinNames() {
		return new String[] { "a", "b" };
	}

	@Override
	public boolean conductsAtDc() {
		return false;
	}

	@Override
	public int historySize() {
		return 2; // voltage and current at the last accepted point
	}

	@Override
	public void stamp(Stamp s) {
		TransientStep step = s.transientStep();
		if (step == null) {
			s.conductance(a, b, 0); // keeps the entries in the pattern; open at DC
			s.current(a, b, 0);
			return;
		}
		double[] h = s.history();
		double geq = (step.trapezoidal() ? 2 : 1) * farads / step.step();
		double offset = step.trapezoidal() ? -(geq * h[0] + h[1]) : -geq * h[0];
		s.conductance(a, b, geq);
		s.current(a, b, offset);
	}

	@Override
	public void accept(SolutionView x, double[] history, TransientStep step) {
		double v = x.voltage(a) - x.voltage(b);
		history[1] = step == null ? 0 : current(v, history, step);
		history[0] = v;
	}

	private double current(double v, double[] history, TransientStep step) {
		double geq = (step.trapezoidal() ? 2 : 1) * farads / step.step();
		return step.trapezoidal() ? geq * (v - history[0]) - history[1] : geq * (v - history[0]);
	}

	@Override
	public double integrated(SolutionView x) {
		return x.voltage(a) - x.voltage(b);
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		TransientStep step = x.transientStep();
		double i = step == null ? 0 : current(x.voltage(a) - x.voltage(b), x.history(), step);
		return new double[] { i, -i };
	}
}
