package bulwark.check.tolerance;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;

import bulwark.lang.design.Design;
import bulwark.lang.design.Requirement;
import bulwark.lang.units.Quantities;

/** The fraction of samples that meet one requirement (or keep every part within its derated ratings). */
public record Yield(String requirement, int met, int of) {

	public double fraction() {
		return of == 0 ? Double.NaN : (double) met / of;
	}

	/** The yield of each of the design's requirements that a followed figure measures, then survival. */
	public static List<Yield> of(Design design, List<Evaluation> samples) {
		List<Yield> yields = new ArrayList<>();
		for (Requirement r : design.getRequirements()) {
			double value = Quantities.si(r.getValue()).orElseThrow();
			String pair = r.getFrom() == null ? null : r.getFrom().getName() + "–" + r.getTo().getName();
			String label = "require " + r.getWhat() + " " + r.getValue().getMagnitude() + " " + r.getValue().getUnit()
					+ (pair == null ? "" : " between " + r.getFrom().getName() + " and " + r.getTo().getName());
			Predicate<Map<Figure, Double>> meets = switch (r.getWhat()) {
			case "threshold" -> all(f -> f.name().startsWith("threshold") && matches(f, pair), x -> x <= value);
			case "test_current" -> all(f -> f.name().startsWith("test current") && matches(f, pair), x -> x <= value);
			case "standby_current" -> all(f -> f.name().equals("standby current"), x -> x <= value);
			case "battery_life" -> all(f -> f.name().equals("battery life"), x -> x * 3600 >= value);
			case "led_test" -> all(f -> f.name().startsWith("open voltage") && matches(f, pair), x -> x >= value);
			default -> null; // hysteresis and the switch-on voltage are not followed by the tolerance analysis
			};
			if (meets != null) {
				yields.add(count(label, samples, meets));
			}
		}
		yields.add(count("every part within its derated ratings", samples,
				all(f -> f.name().startsWith("utilisation "), x -> x <= 1)));
		return yields;
	}

	private static boolean matches(Figure f, String pair) {
		return pair == null || f.name().endsWith(" " + pair);
	}

	/** True when every figure the filter selects meets the test, and at least one is present. */
	private static Predicate<Map<Figure, Double>> all(Predicate<Figure> which, java.util.function.DoublePredicate test) {
		return figures -> {
			boolean any = false;
			for (Map.Entry<Figure, Double> e : figures.entrySet()) {
				if (which.test(e.getKey())) {
					any = true;
					if (!test.test(e.getValue())) {
						return false;
					}
				}
			}
			return any;
		};
	}

	private static Yield count(String label, List<Evaluation> samples, Predicate<Map<Figure, Double>> meets) {
		int met = 0;
		for (Evaluation e : samples) {
			if (meets.test(e.figures())) {
				met++;
			}
		}
		return new Yield(label, met, samples.size());
	}
}
