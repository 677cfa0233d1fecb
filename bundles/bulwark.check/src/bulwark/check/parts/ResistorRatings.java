package bulwark.check.parts;

import java.util.Map;
import java.util.Optional;

import bulwark.lang.design.Part;

/**
 * A resistor's voltage limits. MIL-PRF-39005G §3.5.8 [published, docs/sources.md#resistor-voltage] rates a resistor's voltage
 * at the lower of √(P·R) — the voltage at which it dissipates its rated power — and its limiting element
 * voltage. The first is a power limit in disguise, which resistor-power already checks; this class gives
 * the second: the design's 'rated voltage', else the default of the part's package.
 */
public final class ResistorRatings {
	/** Typical limiting element voltages by package, V [common practice, docs/sources.md#resistor-voltage]; overridable per part. */
	public static final Map<String, Double> PACKAGE_VOLTS = Map.of("0402", 50.0, "0603", 50.0, "0805", 150.0,
			"1206", 200.0, "2512", 200.0, "axial_quarter", 250.0, "axial_half", 300.0);

	private ResistorRatings() {
	}

	/**
	 * The power a package is usually rated for, W [common practice: thick-film chips 1/16 W (0402), 1/10 W
	 * (0603), 1/8 W (0805), 1/4 W (1206), 1 W (2512); axial film parts by their name]: assumed, and said so in
	 * the finding, where the design gives a package and no power rating, so that a deleted rating never turns
	 * a fail into a pass. A part writes its own.
	 */
	public static final Map<String, Double> PACKAGE_WATTS = Map.of("0402", 0.0625, "0603", 0.1, "0805", 0.125,
			"1206", 0.25, "2512", 1.0, "axial_quarter", 0.25, "axial_half", 0.5);

	/** The power rating: rated, else the package's usual one; empty when the design says neither. */
	public static Optional<Rating> power(Part part) {
		return ratedOrByPackage(part, "power", PACKAGE_WATTS, pkg -> "the assumed " + pkg + " power rating");
	}

	/** A rating and what it is: "its rated", or the package's default with its source. */
	public record Rating(double value, String basis) {
	}

	/** The limiting element voltage: rated, else by package; empty when the design says neither. */
	public static Optional<Rating> limitingElementVoltage(Part part) {
		return ratedOrByPackage(part, "voltage", PACKAGE_VOLTS, pkg -> "the " + pkg + " package's limiting element voltage of");
	}

	/** The part's written rating, else its package's value from the table, with what the basis is. */
	private static Optional<Rating> ratedOrByPackage(Part part, String rating, Map<String, Double> byPackage,
			java.util.function.Function<String, String> basis) {
		Optional<Double> rated = Settings.rating(part, rating);
		if (rated.isPresent()) {
			return Optional.of(new Rating(rated.get(), "its rated"));
		}
		return Settings.wordOrNumber(part, "package").filter(byPackage::containsKey)
				.map(pkg -> new Rating(byPackage.get(pkg), basis.apply(pkg.replace('_', ' '))));
	}
}
