package bulwark.engine.circuit;

import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;

/**
 * A potentiometer: total resistance between a and b, the wiper at fraction {@code position} from a
 * (0 at a, 1 at b). Each section keeps at least {@link #END_OHMS}, as a real track does at its ends.
 */
public final class Potentiometer extends MultiTerminal {
	/** Smallest resistance of a section: the wiper's contact and the track's end. [common practice] */
	public static final double END_OHMS = 1e-3;

	private final double upper;
	private final double lower;

	public Potentiometer(String name, int a, int b, int wiper, double ohms, double position) {
		super(name, a, b, wiper);
		if (!(ohms > 0) || Double.isInfinite(ohms) || !(position >= 0 && position <= 1)) {
			throw new IllegalArgumentException(name + ": resistance must be positive and position within 0…1");
		}
		this.upper = Math.max(END_OHMS, ohms * position);
		this.lower = Math.max(END_OHMS, ohms * (1 - position));
	}

	/** The whole track, a to b, Ω. */
	public double ohms() {
		return upper + lower;
	}

	@Override
	public String[] pinNames() {
		return new String[] { "a", "b", "wiper" };
	}

	@Override
	public void stamp(Stamp s) {
		s.conductance(pins[0], pins[2], 1 / upper);
		s.conductance(pins[2], pins[1], 1 / lower);
	}

	@Override
	public double[] pinCurrents(SolutionView x) {
		double ia = (x.voltage(pins[0]) - x.voltage(pins[2])) / upper;
		double ib = (x.voltage(pins[1]) - x.voltage(pins[2])) / lower;
		return new double[] { ia, ib, -ia - ib };
	}
}
