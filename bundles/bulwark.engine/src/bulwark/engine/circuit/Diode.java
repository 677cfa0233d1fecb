package bulwark.engine.circuit;

import bulwark.engine.device.DiodeModel;
import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;

/**
 * A junction diode (also a zener or an LED, by its model's parameters) from anode to cathode. With a series
 * resistance the junction sits between an internal net and the cathode. Nonlinear: stamped as its
 * companion model, g = dI/dv and I(v) − g·v, at the limited junction voltage.
 */
public final class Diode implements Device {
	private final String name;
	private final int anode;
	private final int cathode;
	private final int junction;
	private final DiodeModel model;

	/**
	 * @param junction the internal net between series resistance and junction; must be the anode when the
	 *                 model has no series resistance (see {@link Circuit.Builder#diode})
	 */
	public Diode(String name, int anode, int cathode, int junction, DiodeModel model) {
		if ((model.seriesOhms() > 0) == (junction == anode)) {
			throw new IllegalArgumentException(name + ": an internal net is needed exactly when Rs > 0");
		}
		this.name = name;
		this.anode = anode;
		this.cathode = cathode;
		this.junction = junction;
		this.model = model;
	}

	public DiodeModel model() {
		return model;
	}

	@Override
	public String name() {
		return name;
	}

	@Override
	public int[] pins() {
		return new int[] { anode, cathode };
	}

	@Override
	public String[] pinNames() {
		return new String[] { "anode", "cathode" };
	}

	@Override
	public int[] internalNets() {
		return junction == anode ? new int[0] : new int[] { junction };
	}

	@Override
	public int stateSize() {
		return 2; // last junction voltage, and whether there is one
	}

	@Override
	public boolean nonlinear() {
		return true;
	}

	@Override
	public void stamp(Stamp s) {
		if (junction != anode) {
			s.conductance(anode, junction, 1 / model.seriesOhms());
		}
		JunctionStamp.stamp(s, model, junction, cathode, s.state(), 0);
	}

	@Override
	public String[] junctionNames() {
		return new String[] { "junction" };
	}

	@Override
	public double[] reverseVoltages(SolutionView x) {
		return new double[] { x.voltage(cathode) - x.voltage(anode) };
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		double i = model.current(x.voltage(junction) - x.voltage(cathode));
		return new double[] { i, -i };
	}
}
