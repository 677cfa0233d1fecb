package bulwark.lang.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import bulwark.lang.ide.BulwarkIdeSetup;
import bulwark.lang.ide.highlight.SemanticRanges;
import bulwark.lang.ide.highlight.SemanticRanges.Kind;

/** Each name is classified by what the grammar says it stands for, declarations apart from references. */
class SemanticRangesTest {
	private static final com.google.inject.Injector INJECTOR = new BulwarkIdeSetup().createInjectorAndDoEMFRegistration();

	private static String at(String text, SemanticRanges.Range r) {
		return text.substring(r.offset(), r.offset() + r.length());
	}

	@Test
	void netsTerminalsPartsAndDefinitions() {
		String text = """
				design "names"
				reference net gnd
				net tip
				terminal TIP at tip
				terminal COM at gnd common
				define resistor SMALL { rated power 125 mW }
				resistor R1 (a: tip, b: gnd) is SMALL { value 1 kΩ }
				require threshold 5 Ω between TIP and COM
				waive "resistor-power" on R1 because "short pulses" by "A. Tester" on "2026-12-02"
				""";
		List<SemanticRanges.Range> ranges = SemanticRanges.of(INJECTOR, text, "/tmp/names.bulwark");
		List<String> seen = ranges.stream().map(r -> at(text, r) + ":" + r.kind() + (r.declaration() ? "!" : "")).toList();
		assertEquals(List.of("gnd:NET!", "tip:NET!", "TIP:TERMINAL!", "tip:NET", "COM:TERMINAL!", "gnd:NET", "SMALL:DEFINITION!",
				"R1:PART!", "tip:NET", "gnd:NET", "SMALL:DEFINITION", "TIP:TERMINAL", "COM:TERMINAL", "R1:PART"), seen);
	}

	@Test
	void aTextThatDoesNotParseStillNamesWhatDoes() {
		String text = "design \"broken\"\nnet a\nresistor R1 (a: a, b: \n";
		List<SemanticRanges.Range> ranges = SemanticRanges.of(INJECTOR, text, "/tmp/broken.bulwark");
		assertTrue(ranges.stream().anyMatch(r -> r.kind() == Kind.NET && r.declaration() && at(text, r).equals("a")), ranges.toString());
	}
}
