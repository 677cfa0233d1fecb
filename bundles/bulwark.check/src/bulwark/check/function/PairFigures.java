package bulwark.check.function;

import java.util.List;

/**
 * What an input does across one pair of terminals, a resistance between them swept from a short to an open
 * circuit: whether its indicator is on with the terminals shorted, where it switches as the resistance
 * rises and as it falls (null when it does not switch), the current into a short, the open-circuit voltage,
 * the battery current with the terminals shorted (null without a battery), and the colours of LED under test
 * it lights (from {@link FunctionAnalysis#LED_LIT} with the highest forward voltage of each colour's range),
 * and — for the first pair whose indicator switches — the sweeps themselves, for plots (empty otherwise);
 * then where the indicator switches as a voltage across the pair rises and falls, {@code from} positive
 * ({@code forward}) and {@code to} positive ({@code reverse}).
 */
public record PairFigures(String from, String to, boolean onWhenShorted, Double risingOhms, Double fallingOhms,
		double testCurrentAmps, double openVolts, Double shortedBatteryAmps, List<String> lightsLeds,
		List<SweepPoint> rising, List<SweepPoint> falling, VoltageSwitching forward, VoltageSwitching reverse) {

	public PairFigures {
		lightsLeds = List.copyOf(lightsLeds);
		rising = List.copyOf(rising);
		falling = List.copyOf(falling);
		forward = forward == null ? VoltageSwitching.NONE : forward; // not swept: nothing found, and no problem
		reverse = reverse == null ? VoltageSwitching.NONE : reverse;
	}

	/**
	 * The threshold resistance of a continuity input: where the indicator comes on as the resistance falls
	 * (null when it is not on at a short, or never switches).
	 */
	public Double thresholdOhms() {
		return onWhenShorted ? fallingOhms : null;
	}

	/** The hysteresis at the terminals, when the indicator switches both ways. */
	public Double hysteresisOhms() {
		return risingOhms == null || fallingOhms == null ? null
				: Resolution.beyond(risingOhms, fallingOhms, FunctionAnalysis.RELATIVE);
	}

	/** The switching voltages with this terminal positive (one of the pair's two). */
	public VoltageSwitching withPositive(String terminal) {
		return terminal.equals(from) ? forward : reverse;
	}
}
