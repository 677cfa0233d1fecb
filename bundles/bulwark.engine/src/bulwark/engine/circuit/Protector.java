package bulwark.engine.circuit;

import bulwark.engine.device.Junction;
import bulwark.engine.device.ProtectorModel;
import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;
import bulwark.engine.mna.TransientStep;

/** A series current-limiting protector between pins a and b; see {@link ProtectorModel}. */
public final class Protector extends TwoTerminal {
	private final ProtectorModel model;

	public Protector(String name, int a, int b, ProtectorModel model) {
		super(name, a, b);
		this.model = model;
	}

	@Override
	public String[] pinNames() {
		return new String[] { "a", "b" };
	}

	@Override
	public boolean nonlinear() {
		return true;
	}

	@Override
	public int historySize() {
		return 1; // how long the current has stayed above the trip current, s
	}

	@Override
	public void stamp(Stamp s) {
		double v = s.voltage(a) - s.voltage(b);
		if (passing(s.transientStep(), s.history())) {
			s.conductance(a, b, 1 / model.onOhms());
			s.current(a, b, 0);
			return;
		}
		double g = model.conductance(v) + Junction.GMIN;
		s.conductance(a, b, g);
		s.current(a, b, model.current(v) + Junction.GMIN * v - g * v);
	}

	/** In a transient, before the trip delay has run out, the protector conducts at its on-resistance. */
	private boolean passing(TransientStep step, double[] history) {
		return step != null && history[0] < model.tripSeconds();
	}

	@Override
	public void accept(SolutionView x, double[] history, TransientStep step) {
		double i = pinCurrents(x)[0];
		history[0] = step == null || Math.abs(i) <= model.tripAmps() ? 0 : history[0] + step.step();
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		double v = x.voltage(a) - x.voltage(b);
		double i = passing(x.transientStep(), x.history()) ? v / model.onOhms() : model.current(v) + Junction.GMIN * v;
		return new double[] { i, -i };
	}
}
