package bulwark.engine.solve;

import java.util.Arrays;

import bulwark.engine.linear.CscMatrix;
import bulwark.engine.linear.SparseLu;
import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;
import bulwark.engine.mna.TransientStep;

/**
 * The nodal equations at one iterate: every device adds its stamp to a dense matrix and right-hand side.
 * Also serves as the {@link SolutionView} devices read their pin currents from.
 */
final class Assembly implements Stamp, SolutionView {
	private final Layout layout;
	final CscMatrix matrix;
	final double[] rhs;
	/** The factorisation of this run's matrices, seeded with the pivots of the circuit's last solve. */
	final SparseLu lu;
	private int pivotSearchesKept;
	private final double[][] states;
	private double[] x;
	private int device;
	private boolean limited;
	private double sourceScale = 1;
	private double nodeGmin;
	private double time;
	private TransientStep step;
	private final double[][] histories;

	Assembly(Layout layout) {
		this.layout = layout;
		matrix = layout.pattern.copy();
		rhs = new double[layout.size];
		lu = layout.pivots.fresh();
		histories = new double[layout.devices.length][];
		for (int i = 0; i < histories.length; i++) {
			histories[i] = new double[layout.devices[i].historySize()];
		}
		states = new double[layout.devices.length][];
		for (int i = 0; i < states.length; i++) {
			states[i] = new double[layout.devices[i].stateSize()];
		}
	}

	/** Builds the equations at iterate x. Returns false if some device limited a junction voltage. */
	boolean assemble(double[] iterate, double scale, double gminToReference, TransientStep transientStep) {
		x = iterate;
		step = transientStep;
		time = transientStep == null ? 0 : transientStep.time();
		sourceScale = scale;
		nodeGmin = gminToReference;
		limited = false;
		matrix.clear();
		Arrays.fill(rhs, 0);
		for (device = 0; device < layout.devices.length; device++) {
			cursor = layout.plan.deviceStart[device];
			deviceEnd = layout.plan.deviceStart[device + 1];
			layout.devices[device].stamp(this);
		}
		deviceEnd = 0;
		if (nodeGmin > 0) {
			for (int i = 0; i < layout.nodes; i++) {
				add(i, i, nodeGmin);
			}
		}
		return !limited;
	}

	/** After a converged run: lets later solves of the circuit start from its pivots, if it chose new ones. */
	void keepPivots() {
		if (lu.pivotSearches() != pivotSearchesKept) {
			layout.pivots.keep(lu);
			pivotSearchesKept = lu.pivotSearches();
		}
	}

	/** Forgets the devices' memory of earlier iterates, before a fresh Newton run. */
	void resetStates() {
		for (double[] s : states) {
			Arrays.fill(s, 0);
		}
	}

	/** Binds the view to one device of a solution, to read its pin currents. */
	SolutionView view(double[] solution, int deviceIndex) {
		x = solution;
		device = deviceIndex;
		return this;
	}

	/** A copy of every device's values at the last accepted point, to continue a run from. */
	double[][] copyHistories() {
		double[][] copy = new double[histories.length][];
		for (int i = 0; i < copy.length; i++) {
			copy[i] = histories[i].clone();
		}
		return copy;
	}

	/** Puts back what {@link #copyHistories()} took, as the values at the point a run continues from. */
	void restoreHistories(double[][] saved, double atTime) {
		for (int i = 0; i < histories.length; i++) {
			System.arraycopy(saved[i], 0, histories[i], 0, histories[i].length);
		}
		time = atTime;
	}

	/** Lets every device record its values at an accepted point (the start of a transient, or a time step). */
	void acceptPoint(double[] solution, TransientStep acceptedStep) {
		x = solution;
		step = acceptedStep;
		time = acceptedStep == null ? 0 : acceptedStep.time();
		for (device = 0; device < layout.devices.length; device++) {
			layout.devices[device].accept(this, histories[device], acceptedStep);
		}
	}

	@Override
	public double time() {
		return time;
	}

	@Override
	public TransientStep transientStep() {
		return step;
	}

	@Override
	public double[] history() {
		return histories[device];
	}

	@Override
	public double voltage(int net) {
		return net == 0 ? 0 : x[net - 1];
	}

	@Override
	public double branchCurrent(int k) {
		return x[layout.branchOffset[device] + k];
	}

	@Override
	public void netNet(int rowNet, int colNet, double value) {
		if (rowNet != 0 && colNet != 0) {
			add(rowNet - 1, colNet - 1, value);
		}
	}

	@Override
	public void netBranch(int rowNet, int k, double value) {
		if (rowNet != 0) {
			add(rowNet - 1, layout.branchOffset[device] + k, value);
		}
	}

	@Override
	public void branchNet(int k, int colNet, double value) {
		if (colNet != 0) {
			add(layout.branchOffset[device] + k, colNet - 1, value);
		}
	}

	@Override
	public void branchBranch(int k, int j, double value) {
		add(layout.branchOffset[device] + k, layout.branchOffset[device] + j, value);
	}

	/** The next call of the present device in the layout's {@link StampPlan}, and the end of its stretch. */
	private int cursor;
	private int deviceEnd;

	private void add(int row, int col, double value) {
		int slot = cursor < deviceEnd ? layout.plan.slotIf(cursor, row, col) : -1;
		cursor++;
		if (slot < 0) {
			slot = matrix.slot(row, col);
		}
		if (slot < 0) {
			// a device stamped a place its dry run did not: a bug in that device, never a user error
			throw new IllegalStateException(layout.devices[device].name() + " stamped outside its pattern");
		}
		matrix.addAt(slot, value);
	}

	@Override
	public void injectNet(int net, double amps) {
		if (net != 0) {
			rhs[net - 1] += amps;
		}
	}

	@Override
	public void branchRhs(int k, double value) {
		rhs[layout.branchOffset[device] + k] += value;
	}

	@Override
	public double sourceScale() {
		return sourceScale;
	}

	@Override
	public double[] state() {
		return states[device];
	}

	@Override
	public void notConverged() {
		limited = true;
	}
}
