package bulwark.lang.naming;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/**
 * The known name a mistyped one was most likely meant to be: the closest by edit distance (insertions,
 * deletions, substitutions and swaps of neighbours; Damerau, Comm. ACM 7(3), 1964), ignoring case, when it
 * is close enough to be a slip rather than another name — at most one edit in four characters (a name of one
 * or two characters only by its case).
 */
public final class Suggestion {
	private Suggestion() {
	}

	public static Optional<String> closest(String typed, Collection<String> known) {
		String best = null;
		int bestDistance = Integer.MAX_VALUE;
		String t = typed.toLowerCase(Locale.ROOT);
		for (String k : known) {
			int d = distance(t, k.toLowerCase(Locale.ROOT));
			if (d < bestDistance) {
				bestDistance = d;
				best = k;
			}
		}
		// a name of one or two letters is a slip only when it differs in case: any other edit makes another name
		int allowed = typed.length() <= 2 ? 0 : Math.max(1, typed.length() / 4);
		return best != null && bestDistance <= allowed && !best.equals(typed) ? Optional.of(best) : Optional.empty();
	}

	/** " (did you mean 'x'?)", or nothing when no known name is close. */
	public static String didYouMean(String typed, Collection<String> known) {
		return closest(typed, known).map(s -> " (did you mean '" + s + "'?)").orElse("");
	}

	/** Optimal string alignment distance: Levenshtein's edits plus the swap of two neighbouring characters. */
	static int distance(String a, String b) {
		int[][] d = new int[a.length() + 1][b.length() + 1];
		for (int i = 0; i <= a.length(); i++) {
			d[i][0] = i;
		}
		for (int j = 0; j <= b.length(); j++) {
			d[0][j] = j;
		}
		for (int i = 1; i <= a.length(); i++) {
			for (int j = 1; j <= b.length(); j++) {
				int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
				d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
				if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
					d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
				}
			}
		}
		return d[a.length()][b.length()];
	}
}
