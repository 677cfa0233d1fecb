package bulwark.lang.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.xtext.formatting2.FormatterRequest;
import org.eclipse.xtext.formatting2.IFormatter2;
import org.eclipse.xtext.formatting2.regionaccess.ITextRegionAccess;
import org.eclipse.xtext.formatting2.regionaccess.TextRegionAccessBuilder;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

import com.google.inject.Inject;
import com.google.inject.Provider;

import bulwark.lang.design.Design;

/** The formatter lays a design out in the house style, and leaves the demo designs as they are. */
@ExtendWith(InjectionExtension.class)
@InjectWith(BulwarkInjectorProvider.class)
class FormatterTest {
	@Inject
	private ParseHelper<Design> parser;
	@Inject
	private Provider<IFormatter2> formatters;
	@Inject
	private Provider<FormatterRequest> requests;
	@Inject
	private Provider<TextRegionAccessBuilder> regionAccess;

	private String format(String text) throws Exception {
		Design d = parser.parse(text);
		ITextRegionAccess access = regionAccess.get().forNodeModel((XtextResource) d.eResource()).create();
		FormatterRequest request = requests.get().setTextRegionAccess(access);
		var replacements = formatters.get().format(request);
		return access.getRewriter().renderToString(replacements);
	}

	@Test
	void messyTextIsLaidOut() throws Exception {
		String messy = "design   \"x\"   purpose \"p\"\nreference   net gnd net a\n"
				+ "resistor R1(a:a,b:gnd){value 1kΩ±5% rated power 250mW}\nled D1 (anode: a,cathode: gnd) {colour red}";
		String expected = """
				design "x"
				purpose "p"

				reference net gnd
				net a

				resistor R1 (a: a, b: gnd) {
				  value 1 kΩ ± 5 %
				  rated power 250 mW
				}

				led D1 (anode: a, cathode: gnd) {
				  colour red
				}
				""";
		assertEquals(expected, format(messy));
	}

	@Test
	void casesAreLaidOutLikeParts() throws Exception {
		String messy = "design \"x\"\nreference net gnd\nnet a\nterminal T1 at a\nterminal T2 at gnd\n"
				+ "resistor R1 (a: a, b: gnd) { value 1 kΩ }\ncase \"mains\"{apply 325V behind 2Ω from T1 to T2 short T1 to T2}";
		String expected = """
				design "x"

				reference net gnd
				net a

				terminal T1 at a
				terminal T2 at gnd

				resistor R1 (a: a, b: gnd) {
				  value 1 kΩ
				}

				case "mains" {
				  apply 325 V behind 2 Ω from T1 to T2
				  short T1 to T2
				}
				""";
		assertEquals(expected, format(messy));
	}

	@Test
	void waiversTakeTwoLines() throws Exception {
		String messy = "design \"x\"\nreference net gnd\nnet a\nresistor R1 (a: a, b: gnd) { value 1 kΩ }\n"
				+ "waive \"resistor-power\"   on R1 because \"pulse\" by \"J. Okafor\"   on \"2026-11-30\"";
		String expected = """
				design "x"

				reference net gnd
				net a

				resistor R1 (a: a, b: gnd) {
				  value 1 kΩ
				}

				waive "resistor-power" on R1
				  because "pulse" by "J. Okafor" on "2026-11-30"
				""";
		assertEquals(expected, format(messy));
	}

	@Test
	void formattingIsStable() throws Exception {
		String once = format("design \"x\"\nreference net gnd\nnet a\nterminal T1 \"tip\" at a\n"
				+ "source V1 (plus: a, minus: gnd) { voltage 5 V }\n");
		assertEquals(once, format(once));
	}

	@Test
	void demoDesignsAreAlreadyTidy() throws Exception {
		Path file = Path.of(System.getProperty("bulwark.root", "../.."), "examples", "greenhouse-vent-input.bulwark");
		String text = Files.readString(file);
		assertEquals(text, format(text));
	}
}
