package bulwark.engine.device;

/** Physical constants, exact in the SI since 2019 (BIPM, The International System of Units, 9th ed.). */
public final class Physics {
	/** Boltzmann constant, J/K. */
	public static final double BOLTZMANN = 1.380649e-23;
	/** Elementary charge, C. */
	public static final double ELEMENTARY_CHARGE = 1.602176634e-19;
	/** The temperature models use unless told otherwise, K. */
	public static final double DEFAULT_TEMPERATURE = 300.0;

	private Physics() {
	}

	/** Thermal voltage kT/q; 25.851999786 mV at 300 K. */
	public static double thermalVoltage(double kelvin) {
		return BOLTZMANN * kelvin / ELEMENTARY_CHARGE;
	}
}
