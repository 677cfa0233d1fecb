package bulwark.lang.units;

/**
 * A unit as written, its SI prefix applied: "kΩ" is OHM with the JSR 385 unit kΩ and the factor 1000 to
 * the SI unit; "mAh" is AMPERE_HOUR with factor 3.6 (coulombs).
 */
public record ScaledUnit(Unit unit, javax.measure.Unit<?> measure, double factor) {
}
