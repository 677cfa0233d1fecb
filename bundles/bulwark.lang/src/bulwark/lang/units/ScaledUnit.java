package bulwark.lang.units;

/** A unit with its SI prefix already applied: "kΩ" is OHM with factor 1000. */
public record ScaledUnit(Unit unit, double factor) {
}
