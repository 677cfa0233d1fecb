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

	/** How many findings of each severity a capped list leaves out (see FindingsCap); waived ones apart. */
	record Omitted(long errors, long warnings, long infos, long waived) implements FindingDetail {
	}

	/** One missing rating (the name a part writes after 'rated') and the rule that needs it. */
	record Missing(String rating, RuleId rule) {
	}

	/** The part failed, how, and every consequence of it: other parts over their absolute ratings, cases unsolved. */
	record SingleFault(String part, String mode, List<Consequence> consequences) implements FindingDetail {
		public SingleFault {
			consequences = List.copyOf(consequences);
		}
	}

	/**
	 * One consequence of a fault: a part's rating exceeded in a case (value and absolute rating in the unit),
	 * or a case that cannot be solved ({@code unsolved} its reason, the rest null).
	 */
	record Consequence(String caseName, String part, String rating, Double value, Double rated, String unit,
			String unsolved) {
	}
}
