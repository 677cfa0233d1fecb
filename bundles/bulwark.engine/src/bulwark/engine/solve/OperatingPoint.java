package bulwark.engine.solve;

/**
 * One device's operating point: the voltage at each external pin (against the reference net) and the
 * current into each pin. For two-pin devices {@link #voltage()} is V(first pin) − V(second pin) and
 * {@link #current()} the current into the first pin. {@link #power()} is the power the device absorbs,
 * Σ V·I over its pins (negative for a source that delivers power). Devices with pn junctions also report
 * each junction's reverse voltage, which reverse-voltage and base–emitter ratings limit.
 */
public record OperatingPoint(String device, String[] pinNames, double[] pinVoltages, double[] pinCurrents,
		String[] junctionNames, double[] reverseVoltages) {

	/** A device without junctions. */
	public OperatingPoint(String device, String[] pinNames, double[] pinVoltages, double[] pinCurrents) {
		this(device, pinNames, pinVoltages, pinCurrents, new String[0], new double[0]);
	}

	/** Reverse voltage of the named junction (positive when reverse-biased). */
	public double reverseVoltage(String junction) {
		for (int i = 0; i < junctionNames.length; i++) {
			if (junctionNames[i].equals(junction)) {
				return reverseVoltages[i];
			}
		}
		throw new IllegalArgumentException(device + " has no junction " + junction);
	}

	public double voltage() {
		return pinVoltages[0] - pinVoltages[1];
	}

	public double current() {
		return pinCurrents[0];
	}

	public double power() {
		double p = 0;
		for (int i = 0; i < pinVoltages.length; i++) {
			p += pinVoltages[i] * pinCurrents[i];
		}
		return p;
	}

	public double pinVoltage(String pin) {
		return pinVoltages[index(pin)];
	}

	public double pinCurrent(String pin) {
		return pinCurrents[index(pin)];
	}

	private int index(String pin) {
		for (int i = 0; i < pinNames.length; i++) {
			if (pinNames[i].equals(pin)) {
				return i;
			}
		}
		throw new IllegalArgumentException(device + " has no pin " + pin);
	}
}
