package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * The check's packages point one way: each may use only packages of a lower layer, never its own layer's
 * neighbours or anything above. Read from the sources (imports and fully qualified names outside comments),
 * so that a new arrow against the order fails here rather than in a review.
 */
class PackageLayersTest {
	/** Lowest first; the design notes draw the same map. */
	private static final Map<String, Integer> LAYER = Map.ofEntries(Map.entry("finding", 0), Map.entry("figures", 0),
			Map.entry("io", 0), Map.entry("budget", 0), Map.entry("series", 0), Map.entry("fix", 0), Map.entry("load", 1),
			Map.entry("policy", 2), Map.entry("cases", 3), Map.entry("parts", 4), Map.entry("stress", 5),
			Map.entry("compile", 6), Map.entry("topology", 7), Map.entry("function", 7), Map.entry("faults", 7), Map.entry("rules", 8),
			Map.entry("tolerance", 9), Map.entry("", 10), Map.entry("compare", 11), Map.entry("report", 11));
	private static final Pattern USE = Pattern.compile("\\bbulwark\\.check((?:\\.[a-z]+)*)\\.[A-Z]");
	private static final Pattern COMMENT = Pattern.compile("//[^\\n]*|/\\*.*?\\*/", Pattern.DOTALL);

	@Test
	void everyPackageUsesOnlyLowerLayers() throws IOException {
		Path src = Fixtures.root().resolve("bundles/bulwark.check/src/bulwark/check");
		List<String> wrong = new ArrayList<>();
		TreeSet<String> seen = new TreeSet<>();
		try (Stream<Path> files = Files.walk(src)) {
			for (Path file : files.filter(f -> f.toString().endsWith(".java")).toList()) {
				String from = src.relativize(file.getParent()).toString().replace('/', '.');
				assertTrue(LAYER.containsKey(from), "package bulwark.check." + from + " has no layer in this test");
				seen.add(from);
				String code = COMMENT.matcher(Files.readString(file)).replaceAll("");
				Matcher m = USE.matcher(code);
				while (m.find()) {
					String to = m.group(1).isEmpty() ? "" : m.group(1).substring(1);
					if (!to.equals(from) && LAYER.getOrDefault(to, 99) >= LAYER.get(from)) {
						wrong.add(file.getFileName() + " (" + name(from) + ") uses " + name(to));
					}
				}
			}
		}
		assertTrue(seen.size() > 10, "the sources were not found under " + src);
		assertEquals(List.of(), wrong, "arrows against the layer order");
	}

	private static String name(String sub) {
		return sub.isEmpty() ? "bulwark.check" : "bulwark.check." + sub;
	}
}
