package bulwark.engine.circuit;

import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;
import bulwark.engine.mna.TransientStep;

/**
 * A capacitor with its leakage (insulation resistance) across it: in an operating point only the leakage
 * conducts; in a transient, its companion model for the step h,
 * i = geq·v − (geq·vₙ + iₙ) with geq = 2C/h by the trapezoidal rule, or i = (C/h)·(v − vₙ) by backward
 * Euler (Nagel, ERL memo M520, 1975, §3; any circuit-simulation text).
 */
public final class Capacitor extends TwoTerminal {
	private final double farads;
	private final double leakageSiemens;

	/** An ideal capacitor: no leakage, open at DC. */
	public Capacitor(String name, int a, int b, double farads) {
		this(name, a, b, farads, Double.POSITIVE_INFINITY);
	}

	/** @param leakageOhms the insulation resistance across the capacitor; infinite for none */
	public Capacitor(String name, int a, int b, double farads, double leakageOhms) {
		super(name, a, b);
		if (!(farads > 0) || Double.isInfinite(farads)) {
			throw new IllegalArgumentException(name + ": capacitance must be positive and finite");
		}
		if (!(leakageOhms > 0)) {
			throw new IllegalArgumentException(name + ": leakage resistance must be positive");
		}
		this.farads = farads;
		this.leakageSiemens = 1 / leakageOhms;
	}

	/** The insulation resistance across the capacitor, Ω (infinite for none). */
	public double leakageOhms() {
		return 1 / leakageSiemens;
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
		return leakageSiemens > 0; // through its leakage only
	}

	@Override
	public int historySize() {
		return 2; // voltage and current at the last accepted point
	}

	@Override
	public void stamp(Stamp s) {
		TransientStep step = s.transientStep();
		if (step == null) {
			s.conductance(a, b, leakageSiemens); // keeps the entries in the pattern; only the leakage at DC
			s.current(a, b, 0);
			return;
		}
		double[] h = s.history();
		double geq = (step.trapezoidal() ? 2 : 1) * farads / step.step();
		double offset = step.trapezoidal() ? -(geq * h[0] + h[1]) : -geq * h[0];
		s.conductance(a, b, geq + leakageSiemens);
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
		double v = x.voltage(a) - x.voltage(b);
		double i = (step == null ? 0 : current(v, x.history(), step)) + v * leakageSiemens;
		return new double[] { i, -i };
	}
}
