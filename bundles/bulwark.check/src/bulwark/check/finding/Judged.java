package bulwark.check.finding;

/**
 * The figure a finding judged, in SI units: the rating it was judged against (the name a part writes after
 * 'rated', null when the limit is no rating), the value found, the limit, and the unit; either number is null
 * where a finding has none (a figure that could not be computed, a stress with no rating).
 */
public record Judged(String rating, Double value, Double limit, String unit) {
	public static final Judged NONE = new Judged(null, null, null, null);
}
