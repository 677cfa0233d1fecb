package bulwark.check.policy;

import java.util.Locale;

/**
 * How a Monte Carlo run draws a toleranced value: uniformly over its tolerance, or normally with 3σ at the
 * tolerance (cut there). A policy names it as 'sample uniform' or 'sample normal'.
 */
public enum Distribution {
	UNIFORM, NORMAL;

	/** The word a policy and a report use. */
	public String word() {
		return name().toLowerCase(Locale.ROOT);
	}

	/** The distribution a policy's word names. */
	public static Distribution of(String word) {
		return valueOf(word.toUpperCase(Locale.ROOT));
	}
}
