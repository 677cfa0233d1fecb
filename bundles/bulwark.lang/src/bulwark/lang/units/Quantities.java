package bulwark.lang.units;

import java.util.Optional;

/** Converts a written quantity ("250 mW") to its SI value (0.25) through the JSR 385 implementation. */
public final class Quantities {
	private Quantities() {
	}

	/** The SI value (the number itself when no unit is written), or empty for a unit Bulwark does not know. */
	public static Optional<Double> si(bulwark.lang.design.Quantity q) {
		if (q == null || q.getMagnitude() == null) {
			return Optional.empty();
		}
		double magnitude = Double.parseDouble(q.getMagnitude());
		if (q.getUnit() == null) {
			return Optional.of(magnitude);
		}
		return UnitParser.parse(q.getUnit()).map(u -> toSi(magnitude, u));
	}

	/** The value in the SI unit of its quantity: 225 mAh → 810 C, 4.7 kΩ → 4700 Ω. */
	public static double toSi(double magnitude, ScaledUnit unit) {
		javax.measure.Quantity<?> written = tech.units.indriya.quantity.Quantities.getQuantity(magnitude, unit.measure());
		return siOf(written);
	}

	@SuppressWarnings({ "unchecked", "rawtypes" })
	private static double siOf(javax.measure.Quantity q) {
		return q.to(q.getUnit().getSystemUnit()).getValue().doubleValue();
	}

	/** The unit of the quantity, if it is a known one. */
	public static Optional<Unit> unit(bulwark.lang.design.Quantity q) {
		return q == null ? Optional.empty() : UnitParser.parse(q.getUnit()).map(ScaledUnit::unit);
	}
}
