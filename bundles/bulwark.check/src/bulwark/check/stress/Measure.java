package bulwark.check.stress;

import java.util.function.ToDoubleFunction;

import bulwark.check.compile.FaultCase;
import bulwark.engine.dc.OperatingPoint;

/**
 * One stress a part kind has, taken from a solved operating point and compared with the rating of the
 * same name: a resistor's "power", a diode's "reverse", a transistor's "collector_emitter".
 * {@code notWhenReplaced}: the stress means nothing in a case that replaces the part itself (a battery put
 * in backwards is discharged, not charged, through its nominal positive pin).
 */
public record Measure(String rating, String what, String unit, ToDoubleFunction<OperatingPoint> stress,
		boolean notWhenReplaced) {
	public Measure(String rating, String what, String unit, ToDoubleFunction<OperatingPoint> stress) {
		this(rating, what, unit, stress, false);
	}

	public double of(OperatingPoint point) {
		return stress.applyAsDouble(point);
	}

	/** Whether the stress counts for the part in the case. */
	public boolean appliesIn(FaultCase c, String part) {
		if (c.isSurge() && rating.equals("power")) {
			return false; // continuous ratings do not judge a 50 µs pulse; see SurgeRunner
		}
		return !(notWhenReplaced && c.replaced().containsKey(part));
	}
}
