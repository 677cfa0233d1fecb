package bulwark.check.finding;

import java.util.List;

/**
 * What a finding knows beyond its message, for views and fixes to read instead of parsing the message.
 */
public sealed interface FindingDetail {
	/**
	 * The steps an abuse takes from terminal to terminal through an over-stressed part: terminal names, part
	 * names and "net NAME", in order.
	 */
	record ReversePath(List<String> steps) implements FindingDetail {
		public ReversePath {
			steps = List.copyOf(steps);
		}
	}

	/** The ratings a part lacks, each with the rule that therefore cannot check it. */
	record MissingRatings(List<Missing> missing) implements FindingDetail {
		public MissingRatings {
			missing = List.copyOf(missing);
		}

		public boolean lacks(String rating) {
			return missing.stream().anyMatch(m -> m.rating().equals(rating));
		}
	}

	/** One missing rating (the name a part writes after 'rated') and the rule that needs it. */
	record Missing(String rating, RuleId rule) {
	}
}
