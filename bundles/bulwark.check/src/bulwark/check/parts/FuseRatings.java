package bulwark.check.parts;

import java.util.List;
import java.util.Locale;

import bulwark.check.figures.Figures;
import bulwark.engine.circuit.Fuse;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * A fuse's pre-arcing I²t: the ∫i²dt it takes in before its element melts and it opens; a resettable fuse's
 * the same figure for tripping. Until then the parts behind it carry the full fault current, so the check
 * judges that interval too.
 */
public final class FuseRatings {
	/**
	 * Default pre-arcing I²t per A² of rated current, A²s/A² [memory]: IEC 60127-2's time–current gates for
	 * quick-acting miniature fuses let one carry ten times its rating for up to about 20 ms, (10·I_n)²·0.02 s =
	 * 2·I_n² A²s. The upper end of the gate: the slowest fuse allowed, so the longest stress before it opens.
	 */
	public static final double DEFAULT_I2T_PER_SQUARE_AMPERE = 2.0;

	/**
	 * Default I²t to trip a resettable (polymer) fuse per A² of its hold current, A²s/A² [memory]: polymer fuses
	 * take of the order of a second, up to several, to trip at five times their hold current — they heat
	 * themselves into their high-resistance state, where a fuse element melts in milliseconds — so
	 * (5·I_hold)²·5 s = 125·I_hold² A²s, the slow end: the longest stress before it trips.
	 */
	public static final double DEFAULT_RESETTABLE_I2T_PER_SQUARE_AMPERE = 125.0;

	private FuseRatings() {
	}

	/** The part's rated I²t (A²s), else the default of its kind for its rated (or hold) current. */
	public static double preArcingI2t(Part part, double ratedAmps) {
		double perSquareAmpere = part != null && part.getKind() == PartKind.RESETTABLE_FUSE
				? DEFAULT_RESETTABLE_I2T_PER_SQUARE_AMPERE
				: DEFAULT_I2T_PER_SQUARE_AMPERE;
		return (part == null ? java.util.Optional.<Double>empty() : Settings.rating(part, "i2t"))
				.orElse(perSquareAmpere * ratedAmps * ratedAmps);
	}

	/**
	 * The moment before the given fuses clear, for a case's name: "before F1 opens (pre-arcing I²t 10 mA²s
	 * reached after 43.5 ms)", or for resettable fuses "before F2 trips (I²t to trip 1.25 A²s reached after 5.44 s)".
	 */
	public static String beforeClearing(List<Fuse> clearing, double largestI2t, double seconds) {
		boolean resettable = clearing.stream().allMatch(Fuse::resettable);
		String names = String.join(", ", clearing.stream().map(Fuse::name).toList());
		boolean one = clearing.size() == 1;
		return String.format(Locale.ROOT, "before %s %s (%s %s reached after %s)", names,
				resettable ? (one ? "trips" : "trip") : (one ? "opens" : "open"),
				resettable ? "I²t to trip" : "pre-arcing I²t", Figures.engineering(largestI2t, "A²s"),
				Figures.engineering(seconds, "s"));
	}
}
