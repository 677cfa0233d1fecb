package bulwark.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The design files a check run takes: every design under the given paths, or one share of them when the run
 * is one of several CI runners ('--shard K/N'); or why there is nothing to check, with the exit code.
 */
record DesignSelection(List<Path> files, String refusal, int exitCode) {
	private static final Pattern SHARD = Pattern.compile("(\\d+)/(\\d+)");

	static DesignSelection of(List<Path> paths, String shard) throws IOException {
		List<Path> files = DesignFiles.collect(paths);
		if (shard != null) {
			Matcher m = SHARD.matcher(shard);
			int k = m.matches() ? Integer.parseInt(m.group(1)) : 0, n = m.matches() ? Integer.parseInt(m.group(2)) : 0;
			if (n < 1 || k < 1 || k > n) {
				return refused("--shard takes K/N with 1 ≤ K ≤ N, for example 2/4; not '" + shard + "'", ExitCodes.USAGE);
			}
			files = shard(files, k, n);
			if (files.isEmpty()) {
				return refused("shard " + shard + " holds no design", ExitCodes.CLEAN);
			}
		}
		if (files.isEmpty()) {
			return refused("no design files (*" + DesignFiles.EXTENSION + ") found in " + paths, ExitCodes.USAGE);
		}
		return new DesignSelection(files, null, ExitCodes.CLEAN);
	}

	private static DesignSelection refused(String why, int exitCode) {
		return new DesignSelection(List.of(), why, exitCode);
	}

	/**
	 * The K-th of N shares of the files, by position in path order, so that every runner that lists the same
	 * folders gets the same share and the shares cover every file once.
	 */
	static List<Path> shard(List<Path> files, int k, int n) {
		List<Path> sorted = new ArrayList<>(files);
		sorted.sort(null);
		List<Path> mine = new ArrayList<>();
		for (int i = 0; i < sorted.size(); i++) {
			if (i % n == k - 1) {
				mine.add(sorted.get(i));
			}
		}
		return mine;
	}
}
