package bulwark.engine.circuit;

import bulwark.engine.device.ComparatorModel;
import bulwark.engine.device.ComparatorStage;
import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;

/**
 * A comparator with pins in_plus, in_minus, out, supply_plus, supply_minus; see {@link ComparatorModel}.
 * The four input clamp junctions are stamped like diodes, with junction limiting; the output stage
 * ({@link ComparatorStage}) is linearised with its exact derivatives, on all five pins.
 */
public final class Comparator extends MultiTerminal {
	private static final int INP = ComparatorStage.IN_PLUS, INN = ComparatorStage.IN_MINUS, OUT = ComparatorStage.OUT,
			VP = ComparatorStage.SUPPLY_PLUS, VN = ComparatorStage.SUPPLY_MINUS;
	/** The pins whose equations the output stage's currents enter, in the stage's order. */
	private static final int[] STAGE_ROWS = { OUT, VP, VN };

	private final ComparatorModel model;
	private final ComparatorStage stage;

	public Comparator(String name, int inPlus, int inMinus, int out, int supplyPlus, int supplyMinus,
			ComparatorModel model) {
		super(name, inPlus, inMinus, out, supplyPlus, supplyMinus);
		this.model = model;
		this.stage = new ComparatorStage(model);
	}

	@Override
	public String[] pinNames() {
		return new String[] { "in_plus", "in_minus", "out", "supply_plus", "supply_minus" };
	}

	/** The output and the supplies are joined by the output stage; an input only by its clamps' leakage. */
	@Override
	public int[][] firmlyJoinedPins() {
		return new int[][] { { OUT, VP, VN } };
	}

	/** Half-width of the output's linear region, in units of the tanh argument (tanh(1) = 0.76). */
	private static final double LINEAR_EDGE = 1;

	@Override
	public int stateSize() {
		return 11; // four clamp junction voltages and whether each has one; last input difference, whether, its sign before
	}

	@Override
	public boolean nonlinear() {
		return true;
	}

	@Override
	public void stamp(Stamp s) {
		double[] v = new double[5];
		for (int p = 0; p < 5; p++) {
			v[p] = s.voltage(pins[p]);
		}
		double[] state = s.state();
		clamp(s, state, 0, INP, VP);
		clamp(s, state, 1, VN, INP);
		clamp(s, state, 2, INN, VP);
		clamp(s, state, 3, VN, INN);
		limitInputDifference(s, v, state);
		// output stage: currents into out, supply_plus, supply_minus as functions of all five pin voltages
		double[] i0 = new double[3];
		double[] g = new double[15];
		stage.evaluate(v, i0, g);
		for (int r = 0; r < 3; r++) {
			int row = pins[STAGE_ROWS[r]];
			double linear = 0;
			for (int k = 0; k < 5; k++) {
				s.netNet(row, pins[k], g[5 * r + k]);
				linear += g[5 * r + k] * v[k];
			}
			s.injectNet(row, -(i0[r] - linear));
		}
	}

	/**
	 * Keeps Newton from bouncing between the rails, the way a comparator in negative feedback (an op-amp)
	 * otherwise does: when the input difference has changed sign on two iterations running and lands beyond
	 * the linear region, the stage is evaluated at the switching point instead, where its slope is the full
	 * gain (the same idea as junction limiting; the iterate is then not final). A single change of sign is
	 * left alone: with positive feedback (a Schmitt trigger) it is the real switching and must go through.
	 */
	private void limitInputDifference(Stamp s, double[] v, double[] state) {
		double vd = v[INP] - v[INN];
		double edge = LINEAR_EDGE * Math.max(Math.abs(v[VP] - v[VN]), 1e-3) / (2 * model.gain());
		double previousSign = Math.signum(state[8]);
		double olderSign = state[10];
		boolean bouncing = state[9] != 0 && olderSign != 0 && Math.signum(vd) != previousSign
				&& previousSign != olderSign;
		state[10] = previousSign;
		if (bouncing && Math.abs(vd) > edge) {
			vd = 0;
			v[INP] = v[INN];
			s.notConverged();
		}
		state[8] = vd;
		state[9] = 1;
	}

	/** One clamp junction from pin a (anode) to pin k (cathode). */
	private void clamp(Stamp s, double[] state, int which, int a, int k) {
		JunctionStamp.stamp(s, model.clamp(), pins[a], pins[k], state, 2 * which);
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		double[] v = new double[5];
		for (int p = 0; p < 5; p++) {
			v[p] = x.voltage(pins[p]);
		}
		double c1 = model.clamp().current(v[INP] - v[VP]);
		double c2 = model.clamp().current(v[VN] - v[INP]);
		double c3 = model.clamp().current(v[INN] - v[VP]);
		double c4 = model.clamp().current(v[VN] - v[INN]);
		double[] st = new double[3];
		stage.evaluate(v, st, null);
		double[] i = new double[5];
		i[INP] = c1 - c2;
		i[INN] = c3 - c4;
		i[OUT] = st[0];
		i[VP] = st[1] - c1 - c3;
		i[VN] = st[2] + c2 + c4;
		return i;
	}
}
