package bulwark.engine.mna;

/**
 * The time step a reactive device integrates over: from the last accepted time point to {@code time},
 * by the trapezoidal rule or, on the first step and after a discontinuity, by backward Euler.
 */
public record TransientStep(double time, double step, boolean trapezoidal) {
}
