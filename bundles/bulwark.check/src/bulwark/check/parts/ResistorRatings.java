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

	/** What limits the voltage, and the limit. */
	public record VoltageRating(double volts, String basis) {
	}

	/** The limiting element voltage: rated, else by package; empty when the design says neither. */
	public static Optional<VoltageRating> limitingElementVoltage(Part part) {
		Optional<Double> rated = Settings.rating(part, "voltage");
		if (rated.isPresent()) {
			return Optional.of(new VoltageRating(rated.get(), "its rated"));
		}
		return Settings.wordOrNumber(part, "package").filter(PACKAGE_VOLTS::containsKey)
				.map(pkg -> new VoltageRating(PACKAGE_VOLTS.get(pkg),
						"the " + pkg.replace('_', ' ') + " package's limiting element voltage of"));
	}
}
