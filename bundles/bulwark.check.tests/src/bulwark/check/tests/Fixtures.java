package bulwark.check.tests;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.eclipse.xtext.util.CancelIndicator;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.Finding;
import bulwark.check.load.DesignLoader;
import bulwark.lang.BulwarkStandaloneSetup;

/**
 * Checks inline designs. A fixture marks the findings it expects inside its own text: a comment
 * {@code #! rule-id} at the end of a line expects a finding of that rule on that line.
 */
final class Fixtures {
	private static final Pattern MARK = Pattern.compile("#!\\s*([a-z-]+)");
	private static DesignChecker checker;

	private Fixtures() {
	}

	static synchronized DesignChecker checker() {
		if (checker == null) {
			checker = new DesignChecker(
					new DesignLoader(new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration()));
		}
		return checker;
	}

	static DesignResult check(String text) {
		return checker().check(text, "fixture.bulwark", CancelIndicator.NullImpl);
	}

	/** "line:rule" for each mark of the given rule in the text. */
	static Set<String> expected(String text, String rule) {
		Set<String> marks = new TreeSet<>();
		String[] lines = text.split("\n", -1);
		for (int i = 0; i < lines.length; i++) {
			Matcher m = MARK.matcher(lines[i]);
			while (m.find()) {
				if (m.group(1).equals(rule)) {
					marks.add((i + 1) + ":" + rule);
				}
			}
		}
		return marks;
	}

	/** "line:rule" for each finding of the given rule. */
	static Set<String> actual(DesignResult result, String rule) {
		Set<String> found = new TreeSet<>();
		for (Finding f : result.findings()) {
			if (f.rule().equals(rule)) {
				found.add(f.location().line() + ":" + rule);
			}
		}
		return found;
	}

	static Finding only(DesignResult result, String rule) {
		List<Finding> list = result.findings().stream().filter(f -> f.rule().equals(rule)).toList();
		if (list.size() != 1) {
			throw new AssertionError("expected one " + rule + " finding, got " + result.findings());
		}
		return list.get(0);
	}

	static Path root() {
		return Path.of(System.getProperty("bulwark.root", "../.."));
	}
}
