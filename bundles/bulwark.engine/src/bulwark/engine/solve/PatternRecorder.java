package bulwark.engine.solve;

import bulwark.engine.linear.PatternBuilder;
import bulwark.engine.mna.Stamp;
import bulwark.engine.mna.TransientStep;

/**
 * A dry run of every device's stamp at the zero iterate that records where the entries go, so that the
 * sparse matrix and its fill-reducing order are worked out once per circuit. Devices stamp the same
 * places at every iterate (they never skip an entry because its value happens to be zero); the order of
 * their calls is kept too, as the {@link StampPlan} assemblies replay.
 */
final class PatternRecorder implements Stamp {
	private final Layout layout;
	private final PatternBuilder pattern;
	private final StampPlan plan;
	private int device;

	PatternRecorder(Layout layout, PatternBuilder pattern, StampPlan plan) {
		this.layout = layout;
		this.pattern = pattern;
		this.plan = plan;
	}

	void record() {
		for (device = 0; device < layout.devices.length; device++) {
			plan.beginDevice(device);
			layout.devices[device].stamp(this);
		}
	}

	private void add(int row, int col) {
		pattern.add(row, col);
		plan.add(row, col);
	}

	@Override
	public double voltage(int net) {
		return 0;
	}

	@Override
	public double branchCurrent(int k) {
		return 0;
	}

	@Override
	public void netNet(int rowNet, int colNet, double value) {
		if (rowNet != 0 && colNet != 0) {
			add(rowNet - 1, colNet - 1);
		}
	}

	@Override
	public void netBranch(int rowNet, int k, double value) {
		if (rowNet != 0) {
			add(rowNet - 1, layout.branchOffset[device] + k);
		}
	}

	@Override
	public void branchNet(int k, int colNet, double value) {
		if (colNet != 0) {
			add(layout.branchOffset[device] + k, colNet - 1);
		}
	}

	@Override
	public void branchBranch(int k, int j, double value) {
		add(layout.branchOffset[device] + k, layout.branchOffset[device] + j);
	}

	@Override
	public void injectNet(int net, double amps) {
	}

	@Override
	public void branchRhs(int k, double value) {
	}

	@Override
	public double sourceScale() {
		return 1;
	}

	@Override
	public double[] state() {
		return new double[layout.devices[device].stateSize()];
	}

	@Override
	public double time() {
		return 0;
	}

	@Override
	public TransientStep transientStep() {
		return null;
	}

	@Override
	public double[] history() {
		return new double[layout.devices[device].historySize()];
	}

	@Override
	public void notConverged() {
	}
}
