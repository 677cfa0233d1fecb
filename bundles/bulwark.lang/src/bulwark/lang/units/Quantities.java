package bulwark.lang.units;

import java.util.Optional;

import bulwark.lang.design.Quantity;

/** Converts a written quantity ("250 mW") to its SI value (0.25). */
public final class Quantities {
	private Quantities() {
	}

	/** The SI value (the number itself when no unit is written), or empty for a unit Bulwark does not know. */
	public static Optional<Double> si(Quantity q) {
		if (q == null || q.getMagnitude() == null) {
			return Optional.empty();
		}
		if (q.getUnit() == null) {
			return Optional.of(Double.parseDouble(q.getMagnitude()));
		}
		return UnitParser.parse(q.getUnit()).map(u -> Double.parseDouble(q.getMagnitude()) * u.factor());
	}

	/** The unit of the quantity, if it is a known one. */
	public static Optional<Unit> unit(Quantity q) {
		return q == null ? Optional.empty() : UnitParser.parse(q.getUnit()).map(ScaledUnit::unit);
	}
}
