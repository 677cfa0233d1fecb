package bulwark.check.stress;

import java.util.function.ToDoubleFunction;

import bulwark.check.cases.FaultCase;
import bulwark.check.cases.SolvedCase;
import bulwark.engine.solve.OperatingPoint;

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

	/** Whether the stress counts for the part at the solved instant of the case. */
	public boolean appliesIn(FaultCase c, String part) {
		if (c.isSurge() && isPower()) {
			return false; // continuous ratings do not judge a 50 µs pulse; see SurgeRunner
		}
		if (c.isMains() && isPower()) {
			return false; // a power rating is thermal: judged on the cycle's average, not on an instant
		}
		if (c.momentary() && isPower()) {
			return false; // nor on a moment before a fuse opens: that is judged as a pulse
		}
		return !(notWhenReplaced && c.replaced().containsKey(part));
	}

	/** The figure judged of a part in a solved case (see below). */
	public double judged(SolvedCase c, String part) {
		return judged(c.faultCase(), c.solution().device(part), c.averagePower(), part);
	}

	/**
	 * The figure the rating is judged on in this case, NaN when the case does not judge it: the value at the
	 * solved instant, except a power rating under mains, judged on the part's power averaged over the cycle.
	 */
	public double judged(FaultCase c, OperatingPoint point, java.util.Map<String, Double> averagePower, String part) {
		if (c.isMains() && isPower()) {
			Double average = averagePower.get(part);
			return average == null ? Double.NaN : Math.abs(average);
		}
		return appliesIn(c, part) ? of(point) : Double.NaN;
	}

	/** What the figure is called in the case: "power", or "average power over the cycle" under mains. */
	public String what(FaultCase c) {
		return c.isMains() && isPower() ? "average " + what + " over the cycle" : what;
	}

	private boolean isPower() {
		return rating.equals("power");
	}
}
