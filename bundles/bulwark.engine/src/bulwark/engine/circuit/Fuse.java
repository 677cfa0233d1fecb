package bulwark.engine.circuit;

/**
 * A fuse or a resettable fuse: in a solve, its cold resistance. Whether it opens is a comparison of the
 * solved current with its ratings (rated current; for a resettable fuse the hold and trip currents), made
 * by the rating checks, so that the solved case shows the stress that would open it.
 */
public final class Fuse extends Resistor {
	private final double ratedAmps;
	private final boolean resettable;

	public Fuse(String name, int a, int b, double coldOhms, double ratedAmps, boolean resettable) {
		super(name, a, b, coldOhms);
		if (!(ratedAmps > 0)) {
			throw new IllegalArgumentException(name + ": rated current must be positive");
		}
		this.ratedAmps = ratedAmps;
		this.resettable = resettable;
	}

	public double ratedAmps() {
		return ratedAmps;
	}

	public boolean resettable() {
		return resettable;
	}
}
