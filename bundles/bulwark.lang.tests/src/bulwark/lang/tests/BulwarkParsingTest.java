package bulwark.lang.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.emf.ecore.resource.Resource.Diagnostic;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.eclipse.xtext.testing.validation.ValidationTestHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

import com.google.inject.Inject;

import bulwark.lang.design.Design;
import bulwark.lang.design.Net;
import bulwark.lang.design.Parameter;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.lang.design.Rating;
import bulwark.lang.design.Terminal;
import bulwark.lang.units.Quantities;

/** Named so because the language generator writes a stub of this name when none exists. */

@ExtendWith(InjectionExtension.class)
@InjectWith(BulwarkInjectorProvider.class)
class BulwarkParsingTest {
	@Inject
	private ParseHelper<Design> parser;
	@Inject
	private ValidationTestHelper validation;

	@Test
	void parsesAWholeDesign() throws Exception {
		Design d = parser.parse("""
				# a comment
				design "Divider" purpose "test" revision "A"
				reference net gnd
				net in
				terminal T1 "input" at in
				terminal T2 at gnd common
				battery B1 (plus: in, minus: gnd) { emf 3 V resistance 8 Ω capacity 225 mAh }
				resistor R1 (b: gnd, a: in) {
				  value 4.7 kohm ± 5 %
				  rated power 250 mW
				  rated voltage 200 V
				}
				""");
		List<Diagnostic> errors = d.eResource().getErrors();
		assertTrue(errors.isEmpty(), errors.toString());
		validation.assertNoIssues(d);
		assertEquals("Divider", d.getTitle());
		assertEquals("A", d.getRevision());
		assertTrue(((Net) d.getMembers().get(0)).isReference());
		Terminal t2 = (Terminal) d.getMembers().get(3);
		assertTrue(t2.isCommon());
		assertEquals("gnd", t2.getNet().getName());
		Part r1 = (Part) d.getMembers().get(5);
		assertEquals(PartKind.RESISTOR, r1.getKind());
		assertEquals("gnd", r1.getPins().get(0).getNet().getName());
		Parameter value = (Parameter) r1.getSettings().get(0);
		assertEquals(4700.0, Quantities.si(value.getValue()).orElseThrow(), 1e-9);
		assertEquals("5", value.getTolerance().getPercent());
		Rating power = (Rating) r1.getSettings().get(1);
		assertEquals(0.25, Quantities.si(power.getValue()).orElseThrow(), 1e-15);
	}

	@Test
	void unitMayFollowTheNumberWithoutSpace() throws Exception {
		Design d = parser.parse("""
				design "x"
				reference net gnd
				net a
				resistor R1 (a: a, b: gnd) { value 10kΩ }
				source V1 (plus: a, minus: gnd) { voltage -5V }
				""");
		validation.assertNoIssues(d);
		Part v1 = (Part) d.getMembers().get(3);
		assertEquals(-5.0, Quantities.si(v1.getSettings().get(0).getValue()).orElseThrow(), 0);
	}

	@Test
	void bareprefixIsExplained() throws Exception {
		Design d = parser.parse("design \"x\"\nreference net gnd\nnet a\nresistor R1 (a: a, b: gnd) { value 10k }\n");
		List<Diagnostic> errors = d.eResource().getErrors();
		assertEquals(1, errors.size(), errors.toString());
		assertEquals("'k' after 10 is only a prefix: write the unit too, for example 10 kΩ", errors.get(0).getMessage());
		assertEquals(4, errors.get(0).getLine());
	}

	@Test
	void aKeywordAsANameIsExplained() throws Exception {
		Design d = parser.parse("design \"x\"\nreference net gnd\nnet led\n");
		List<Diagnostic> errors = d.eResource().getErrors();
		assertEquals("'led' is a word of the language and cannot be a name as it is; write ^led to use it as one",
				errors.get(0).getMessage());
		assertEquals(3, errors.get(0).getLine());
		Design escaped = parser.parse("design \"x\"\nreference net gnd\nnet ^led\n");
		assertTrue(escaped.eResource().getErrors().isEmpty(), escaped.eResource().getErrors().toString());
	}

	/** The lexer reads TA (tera-ampere), s (second), A and fA as units; as names they are names all the same. */
	@Test
	void namesThatReadAsUnitSymbolsAreNames() throws Exception {
		Design d = parser.parse("""
				design "unit-like names"
				reference net gnd
				net s
				terminal TA "tip" at s
				terminal COM "common" at gnd common
				resistor A (a: s, b: gnd) { value 1 kΩ rated power 250 mW }
				define resistor fA { rated power 125 mW }
				resistor V (a: s, b: gnd) is fA { value 2 kΩ }
				case "under test" { connect 10 Ω from TA to COM }
				require threshold 5 Ω between TA and COM
				waive "resistor-power" on A because "bench only" by "K. Ito" on "2026-12-04"
				""");
		assertTrue(d.eResource().getErrors().isEmpty(), d.eResource().getErrors().toString());
		validation.assertNoErrors(d);
		List<String> names = d.getMembers().stream().map(m -> m.getName()).toList();
		assertEquals(List.of("gnd", "s", "TA", "COM", "A", "fA", "V", "under test"), names);
		bulwark.lang.design.Part v = (bulwark.lang.design.Part) d.getMembers().get(6);
		assertEquals("fA", v.getBase().getName());
		assertEquals("s", v.getPins().get(0).getNet().getName());
		assertEquals("A", d.getWaivers().get(0).getPart().getName());
		assertEquals("TA", d.getRequirements().get(0).getFrom().getName());
	}

	@Test
	void unknownUnitWordIsExplained() throws Exception {
		Design d = parser.parse("design \"x\"\nreference net gnd\nnet a\nsource V1 (plus: a, minus: gnd) { voltage 5 volts }\n");
		List<Diagnostic> errors = d.eResource().getErrors();
		assertEquals(1, errors.size(), errors.toString());
		assertTrue(errors.get(0).getMessage().startsWith("'volts' after 5 is not a unit Bulwark knows"),
				errors.get(0).getMessage());
	}

	@Test
	void namesThatStartLikeUnitsAreNames() throws Exception {
		Design d = parser.parse("""
				design "x"
				reference net gnd
				net Vcc
				net mA_sense
				source V1 (plus: Vcc, minus: gnd) { voltage 5V }
				resistor R1 (a: Vcc, b: mA_sense) { value 10kΩ }
				resistor R2 (a: mA_sense, b: gnd) { value 1 kohm }
				""");
		validation.assertNoIssues(d);
	}

	@Test
	void syntaxErrorHasLineAndColumn() throws Exception {
		Design d = parser.parse("""
				design "x"
				reference net gnd
				resistor R1 (a gnd) { value 1 kΩ }
				""");
		List<Diagnostic> errors = d.eResource().getErrors();
		assertEquals(1, errors.size(), errors.toString());
		assertEquals(3, errors.get(0).getLine());
		assertEquals(16, errors.get(0).getColumn()); // "gnd": a ':' was expected after the pin name
	}
}
