package bulwark.check.tolerance;

/**
 * One figure a tolerance analysis follows: its name ("threshold TIP–COM", "utilisation R1"), unit, and
 * whether a larger value is the worse one (a current ceiling, a utilisation) or the better (battery life).
 */
public record Figure(String name, String unit, boolean largerIsWorse) {
}
