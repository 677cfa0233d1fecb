package bulwark.check.function;

/** One point of a threshold sweep: the resistance across the terminals, the current into it, the indicator. */
public record SweepPoint(double ohms, double amps, boolean on) {
}
