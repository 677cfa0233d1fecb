package bulwark.engine.circuit;

import bulwark.engine.device.DiodeModel;
import bulwark.engine.mna.Stamp;

/**
 * Stamps one pn junction — a diode, a comparator's input clamp, a MOSFET's body diode — as its companion
 * model at the limited junction voltage. The junction keeps two doubles of device state from {@code slot}:
 * its last voltage and whether it has one.
 */
final class JunctionStamp {
	private JunctionStamp() {
	}

	static void stamp(Stamp s, DiodeModel model, int anode, int cathode, double[] state, int slot) {
		double v = s.voltage(anode) - s.voltage(cathode);
		if (state[slot + 1] != 0) {
			double limited = model.limit(v, state[slot]);
			if (limited != v) {
				s.notConverged();
				v = limited;
			}
		}
		state[slot] = v;
		state[slot + 1] = 1;
		double g = model.conductance(v);
		s.conductance(anode, cathode, g);
		s.current(anode, cathode, model.current(v) - g * v);
	}
}
