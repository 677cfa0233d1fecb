package bulwark.lang.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.List;
import java.util.Random;

import org.eclipse.emf.ecore.resource.Resource.Diagnostic;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.testing.validation.ValidationTestHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

import com.google.inject.Inject;
import com.google.inject.Provider;

import bulwark.lang.design.Design;

/**
 * Malformed texts end in errors with a line and a column, never in an exception or a hang. The deadline
 * is a guard against hangs, not a measurement (speed is measured by the benchmarks).
 */
@ExtendWith(InjectionExtension.class)
@InjectWith(BulwarkInjectorProvider.class)
class MalformedInputTest {
	private static final Duration NO_HANG = Duration.ofSeconds(30);
	private static final long SEED = 11L;
	private static final String GOOD = """
			design "ok"
			reference net gnd
			net a
			source V1 (plus: a, minus: gnd) { voltage 5 V }
			resistor R1 (a: a, b: gnd) { value 1 kΩ rated power 250 mW }
			""";

	@Inject
	private Provider<XtextResourceSet> resourceSets;
	@Inject
	private ValidationTestHelper validation;

	private void assertLocatedErrors(String text) {
		assertHandled(text, true);
	}

	/** Loads and validates; every error must carry its place, and with {@code expectError} there must be one. */
	private void assertHandled(String text, boolean expectError) {
		assertTimeoutPreemptively(NO_HANG, () -> {
			XtextResourceSet set = resourceSets.get();
			Resource resource = set.createResource(URI.createURI("malformed.bulwark"));
			resource.load(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)), null);
			List<Diagnostic> errors = resource.getErrors();
			Design d = resource.getContents().isEmpty() ? null : (Design) resource.getContents().get(0);
			List<org.eclipse.xtext.validation.Issue> issues = d == null ? List.of() : validation.validate(d);
			if (expectError) {
				assertFalse(errors.isEmpty() && issues.isEmpty(), "no error for:\n" + abbreviate(text));
			}
			for (Diagnostic e : errors) {
				assertTrue(e.getLine() >= 1 && e.getColumn() >= 1, "unlocated: " + e.getMessage());
			}
			for (var i : issues) {
				assertTrue(i.getLineNumber() != null && i.getLineNumber() >= 1, "unlocated: " + i.getMessage());
			}
		});
	}

	@Test
	void everyTruncation() {
		// some cuts leave a valid, smaller design ("reference net gn"); the others must say where they broke
		for (int cut = 1; cut < GOOD.length(); cut++) {
			assertHandled(GOOD.substring(0, cut), false);
		}
		assertLocatedErrors(GOOD.substring(0, GOOD.indexOf("{ voltage") + 3));
		assertLocatedErrors(GOOD.substring(0, GOOD.indexOf("(plus:") + 4));
	}

	@Test
	void binaryJunk() {
		Random random = new Random(SEED);
		for (int trial = 0; trial < 50; trial++) {
			byte[] bytes = new byte[1 + random.nextInt(400)];
			random.nextBytes(bytes);
			assertLocatedErrors(new String(bytes, java.nio.charset.StandardCharsets.ISO_8859_1));
		}
	}

	@Test
	void unbalancedBracesAndParentheses() {
		assertLocatedErrors(GOOD.replace("{ value 1 kΩ", "{ { value 1 kΩ"));
		assertLocatedErrors(GOOD.replace("rated power 250 mW }", "rated power 250 mW"));
		assertLocatedErrors(GOOD.replace("(a: a, b: gnd)", "(a: a, b: gnd"));
		assertLocatedErrors(GOOD + "}}}}}}");
		assertLocatedErrors(GOOD + "(".repeat(10_000));
	}

	@Test
	void aOneMegabyteLine() {
		assertLocatedErrors(GOOD + "net " + "n".repeat(1_000_000) + " " + "x".repeat(10) + "\n");
		assertLocatedErrors(GOOD + "#" + "c".repeat(1_000_000) + "\nnet");
	}

	@Test
	void unterminatedString() {
		assertLocatedErrors("design \"never closed\nreference net gnd\n");
	}

	private static String abbreviate(String s) {
		return s.length() > 200 ? s.substring(0, 200) + "…" : s;
	}
}
