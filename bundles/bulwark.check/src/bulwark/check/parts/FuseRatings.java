package bulwark.check.parts;

import bulwark.lang.design.Part;

/**
 * A fuse's pre-arcing I²t: the ∫i²dt it takes in before its element melts and it opens. Until then the parts
 * behind it carry the full fault current, so the check judges that interval too.
 */
public final class FuseRatings {
	/**
	 * Default pre-arcing I²t per A² of rated current, A²s/A² [memory]: IEC 60127-2's time–current gates for
	 * quick-acting miniature fuses let one carry ten times its rating for up to about 20 ms, (10·I_n)²·0.02 s =
	 * 2·I_n² A²s. The upper end of the gate: the slowest fuse allowed, so the longest stress before it opens.
	 */
	public static final double DEFAULT_I2T_PER_SQUARE_AMPERE = 2.0;

	private FuseRatings() {
	}

	/** The part's rated pre-arcing I²t (A²s), else the default for its rated current. */
	public static double preArcingI2t(Part part, double ratedAmps) {
		return (part == null ? java.util.Optional.<Double>empty() : Settings.rating(part, "i2t"))
				.orElse(DEFAULT_I2T_PER_SQUARE_AMPERE * ratedAmps * ratedAmps);
	}
}
