package bulwark.lang.units;

import java.util.List;

/** The SI units a design may write, each with the symbols accepted for it and the quantity it measures. */
public enum Unit {
	OHM("resistance", "Ω", "ohm", "Ohm"),
	VOLT("voltage", "V"),
	AMPERE("current", "A"),
	WATT("power", "W"),
	AMPERE_HOUR("charge", "Ah"),
	FARAD("capacitance", "F"),
	HENRY("inductance", "H"),
	SECOND("time", "s"),
	HERTZ("frequency", "Hz");

	private final String quantity;
	private final List<String> symbols;

	Unit(String quantity, String... symbols) {
		this.quantity = quantity;
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

	List<String> symbols() {
		return symbols;
	}
}
