package bulwark.cli;

/** The cautions every report carries. */
public final class Safety {
	public static final String CAUTION = "Caution: mains and surge energy can kill. Bulwark checks a model, not a "
			+ "built board. Follow IEC 61010-1 and local codes; sign-off belongs to a competent, licensed person.";

	private Safety() {
	}
}
