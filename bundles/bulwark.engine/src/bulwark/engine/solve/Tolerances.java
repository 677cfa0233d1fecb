package bulwark.engine.solve;

/**
 * When a Newton iterate counts as the solution. An unknown has converged when its last update is within
 * {@code relative} × its magnitude plus the absolute tolerance of its kind (volts for nets, amperes for
 * branch currents), no junction voltage was limited, and every net's current residual is within
 * {@code relative} × the largest current meeting there plus {@code current}. The scheme follows Nagel
 * (Nagel, ERL memo M520, 1975, §4), with tighter defaults: rating checks compare small differences.
 */
public record Tolerances(double relative, double voltage, double current, int maxIterations) {
	public static final Tolerances DEFAULT = new Tolerances(1e-9, 1e-9, 1e-14, 200);

	public Tolerances {
		if (!(relative > 0 && voltage > 0 && current > 0 && maxIterations > 1)) {
			throw new IllegalArgumentException("tolerances must be positive");
		}
	}
}
