package bulwark.engine.circuit;

import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;
import bulwark.engine.mna.TransientStep;

/**
 * An inductor with its current as a branch unknown: a short (0 V) in an operating point; in a transient,
 * v − req·i = −req·iₙ − vₙ with req = 2L/h by the trapezoidal rule, or v − (L/h)·i = −(L/h)·iₙ by backward
 * Euler (Nagel, ERL memo M520, 1975, §3).
 */
public final class Inductor extends TwoTerminal {
	private final double henries;

	public Inductor(String name, int a, int b, double henries) {
		super(name, a, b);
		if (!(henries > 0) || Double.isInfinite(henries)) {
			throw new IllegalArgumentException(name + ": inductance must be positive and finite");
		}
		this.henries = henries;
	}

	public double henries() {
		return henries;
	}

	@Override
	public String[] pinNames() {
		return new String[] { "a", "b" };
	}

	@Override
	public int branchCount() {
		return 1;
	}

	@Override
	public boolean idealVoltage() {
		return true; // a short at DC: in a loop with ideal sources it makes the operating point undefined
	}

	@Override
	public int historySize() {
		return 2; // current and voltage at the last accepted point
	}

	@Override
	public void stamp(Stamp s) {
		s.incidence(0, a, b);
		TransientStep step = s.transientStep();
		if (step == null) {
			s.branchBranch(0, 0, 0);
			return;
		}
		double[] h = s.history();
		double req = (step.trapezoidal() ? 2 : 1) * henries / step.step();
		s.branchBranch(0, 0, -req);
		s.branchRhs(0, step.trapezoidal() ? -req * h[0] - h[1] : -req * h[0]);
	}

	@Override
	public void accept(SolutionView x, double[] history, TransientStep step) {
		history[0] = x.branchCurrent(0);
		history[1] = x.voltage(a) - x.voltage(b);
	}

	@Override
	public double integrated(SolutionView x) {
		return x.branchCurrent(0);
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		double i = x.branchCurrent(0);
		return new double[] { i, -i };
	}
}
