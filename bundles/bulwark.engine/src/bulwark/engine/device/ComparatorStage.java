package bulwark.engine.device;

/**
 * The output stage of a {@link ComparatorModel}: the currents into out, supply_plus and supply_minus as
 * functions of the five pin voltages, with their exact derivatives for Newton's linearisation (the
 * derivatives of the model's tanh form taken by hand; a test compares them with central differences).
 * The output current is drawn from the upper rail when sourcing and returned to the lower rail when
 * sinking, split smoothly over {@link #RETURN_SPLIT}.
 */
public final class ComparatorStage {
	/** Pin order of the voltages and of the Jacobian's columns. */
	public static final int IN_PLUS = 0, IN_MINUS = 1, OUT = 2, SUPPLY_PLUS = 3, SUPPLY_MINUS = 4;
	/** Current scale over which the output's return current moves from one rail to the other. */
	public static final double RETURN_SPLIT = 1e-6;
	/** Smallest supply span the switching slope is scaled by, so that unpowered parts stay finite. */
	private static final double SMALLEST_SPAN = 1e-3;

	private final ComparatorModel model;

	public ComparatorStage(ComparatorModel model) {
		this.model = model;
	}

	/**
	 * Writes the currents into out, supply_plus, supply_minus to {@code currents[0..2]} and, when
	 * {@code jacobian} is not null, their derivatives: {@code jacobian[5·r + k]} = ∂currents[r]/∂v[k].
	 */
	public void evaluate(double[] v, double[] currents, double[] jacobian) {
		double span = v[SUPPLY_PLUS] - v[SUPPLY_MINUS];
		double vd = v[IN_PLUS] - v[IN_MINUS];
		double absSpan = Math.abs(span);
		double scaledSpan = Math.max(absSpan, SMALLEST_SPAN);
		double a = 2 * model.gain() / scaledSpan;
		// d a / d span: zero where the span is clamped at its smallest value
		double aPerSpan = absSpan > SMALLEST_SPAN ? -a / scaledSpan * Math.signum(span) : 0;
		double t = Math.tanh(a * vd);
		double slope = 1 - t * t; // d tanh(u) / du
		double ro = model.outputOhms();
		double out;
		// d out / d (vd, span, v_out, v_supply_minus) with the other three held
		double dVd, dSpan, dOut, dMinus;
		if (model.openDrain()) {
			// on (sinking to the lower rail) when vin+ < vin−
			double on = (1 - t) / 2;
			double across = v[OUT] - v[SUPPLY_MINUS];
			out = across / ro * on;
			dVd = across / ro * (-slope * a / 2);
			dSpan = across / ro * (-slope * vd * aPerSpan / 2);
			dOut = on / ro;
			dMinus = -on / ro;
		} else {
			double target = v[SUPPLY_MINUS] + span * (1 + t) / 2;
			out = (v[OUT] - target) / ro;
			dVd = -(span / 2 * slope * a) / ro;
			dSpan = -((1 + t) / 2 + span / 2 * slope * vd * aPerSpan) / ro;
			dOut = 1 / ro;
			dMinus = -1 / ro;
		}
		double sourced = -out; // current the output delivers into its load
		double tu = Math.tanh(sourced / RETURN_SPLIT);
		double upper = (1 + tu) / 2;
		currents[0] = out;
		currents[1] = model.quiescentAmps() + sourced * upper;
		currents[2] = -model.quiescentAmps() + sourced * (1 - upper);
		if (jacobian == null) {
			return;
		}
		// ∂out/∂v per pin, from its derivatives along vd = v+ − v−, span = V+ − V−, v_out and V− itself
		double[] dOutDv = { dVd, -dVd, dOut, dSpan, dMinus - dSpan };
		double upperPerSourced = (1 - tu * tu) / (2 * RETURN_SPLIT);
		double plusPerSourced = upper + sourced * upperPerSourced;
		double minusPerSourced = (1 - upper) - sourced * upperPerSourced;
		for (int k = 0; k < 5; k++) {
			jacobian[k] = dOutDv[k];
			jacobian[5 + k] = -dOutDv[k] * plusPerSourced;
			jacobian[10 + k] = -dOutDv[k] * minusPerSourced;
		}
	}
}
