package bulwark.lang.units;

import java.util.List;

import tech.units.indriya.unit.Units;

/**
 * The units a design may write, each with the symbols accepted for it, the quantity it measures, and its
 * JSR 385 unit (Indriya's), through which values are converted to SI once, when the design is read.
 */
public enum Unit {
	OHM("resistance", Units.OHM, "Ω", "ohm", "Ohm"),
	VOLT("voltage", Units.VOLT, "V"),
	AMPERE("current", Units.AMPERE, "A"),
	WATT("power", Units.WATT, "W"),
	/** Battery capacity; SI value in coulombs (1 Ah = 3600 C). */
	AMPERE_HOUR("charge", Units.AMPERE.multiply(Units.HOUR), "Ah"),
	FARAD("capacitance", Units.FARAD, "F"),
	HENRY("inductance", Units.HENRY, "H"),
	SECOND("time", Units.SECOND, "s"),
	/** The hour, accepted for use with the SI (BIPM SI brochure, 9th ed., table 8); SI value in seconds. */
	HOUR("time", Units.HOUR, "h"),
	HERTZ("frequency", Units.HERTZ, "Hz"),
	/** A part's single-pulse energy rating (a surge). */
	JOULE("energy", Units.JOULE, "J"),
	/** A fuse's pre-arcing (melting) integral ∫i²dt, which it must take in before it opens. */
	AMPERE_SQUARED_SECOND("melting integral", Units.AMPERE.pow(2).multiply(Units.SECOND), "A²s", "A2s");

	private final String quantity;
	private final javax.measure.Unit<?> measure;
	private final List<String> symbols;

	Unit(String quantity, javax.measure.Unit<?> measure, String... symbols) {
		this.quantity = quantity;
		this.measure = measure;
		this.symbols = List.of(symbols);
	}

	/** What the unit measures, for messages: "resistance". */
	public String quantity() {
		return quantity;
	}

	/** The preferred symbol, used when Bulwark writes a value. */
	public String symbol() {
		return symbols.get(0);
	}

	/** The JSR 385 unit. */
	public javax.measure.Unit<?> measure() {
		return measure;
	}

	/** Whether both measure the same quantity (their dimensions agree): hours and seconds do. */
	public boolean sameQuantity(Unit other) {
		return other != null && measure.isCompatible(other.measure);
	}

	List<String> symbols() {
		return symbols;
	}
}
