package bulwark.engine.dc;

/**
 * One device's DC operating point. {@code voltage} is V(pin a) − V(pin b); {@code current} flows into pin a
 * through the device; {@code power} = voltage · current is the power the device absorbs (negative for a
 * source that delivers power).
 */
public record OperatingPoint(String device, double voltage, double current, double power) {
}
