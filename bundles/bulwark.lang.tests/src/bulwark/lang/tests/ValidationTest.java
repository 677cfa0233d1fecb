package bulwark.lang.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.eclipse.xtext.testing.validation.ValidationTestHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

import com.google.inject.Inject;

import bulwark.lang.design.Design;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.validation.IssueCodes;

/** Each structural mistake gets its issue code, on the element it concerns. */
@ExtendWith(InjectionExtension.class)
@InjectWith(BulwarkInjectorProvider.class)
class ValidationTest {
	@Inject
	private ParseHelper<Design> parser;
	@Inject
	private ValidationTestHelper validation;

	private Design parse(String body) throws Exception {
		return parser.parse("design \"t\"\nreference net gnd\nnet a\n" + body);
	}

	@Test
	void unitIsRequired() throws Exception {
		Design d = parse("resistor R1 (a: a, b: gnd) { value 10 }");
		validation.assertError(d, DesignPackage.Literals.QUANTITY, IssueCodes.MISSING_UNIT,
				"value needs its unit: write for example 10 Ω");
	}

	/** integrity high keeps a part out of the single-fault analysis: only with its reason, and only it takes one. */
	@Test
	void integrityHighNeedsItsReason() throws Exception {
		validation.assertNoErrors(parse("resistor R1 (a: a, b: gnd) { value 10 kΩ integrity high because \"fusible\" }"));
		validation.assertError(parse("resistor R1 (a: a, b: gnd) { value 10 kΩ integrity high }"),
				DesignPackage.Literals.PARAMETER, IssueCodes.VALUE_OUT_OF_RANGE, "needs its reason");
		validation.assertError(parse("resistor R1 (a: a, b: gnd) { value 10 kΩ because \"x\" }"),
				DesignPackage.Literals.PARAMETER, IssueCodes.UNKNOWN_PARAMETER, "only integrity takes a reason");
	}

	@Test
	void plainNumberTakesNoUnit() throws Exception {
		Design d = parse("npn Q1 (collector: a, base: a, emitter: gnd) { beta 100 V }");
		validation.assertError(d, DesignPackage.Literals.QUANTITY, IssueCodes.UNEXPECTED_UNIT, "plain number");
		validation.assertNoErrors(parse("npn Q1 (collector: a, base: a, emitter: gnd) { beta 100 }"));
	}

	@Test
	void smallCurrentsInFemtoamperesOrWithAnExponent() throws Exception {
		Design d = parse("diode D1 (anode: a, cathode: gnd) { saturation 10 fA }\n"
				+ "diode D2 (anode: a, cathode: gnd) { saturation 1e-14 A }\n"
				+ "diode D3 (anode: a, cathode: gnd) { saturation 2.5E-3 pA }");
		validation.assertNoErrors(d);
		var parts = d.getMembers().stream().filter(bulwark.lang.design.Part.class::isInstance)
				.map(bulwark.lang.design.Part.class::cast).toList();
		// 10 fA = 1e-14 A = 1e-14 A; 2.5e-3 pA = 2.5e-15 A [SI prefixes, BIPM SI brochure table 7]
		double[] expected = { 1e-14, 1e-14, 2.5e-15 };
		for (int i = 0; i < 3; i++) {
			double si = bulwark.lang.units.Quantities.si(parts.get(i).getSettings().get(0).getValue()).orElseThrow();
			assertEquals(expected[i], si, expected[i] * 1e-12);
		}
	}

	@Test
	void aNumberTooLargeToComputeWithIsALocatedError() throws Exception {
		validation.assertError(parse("resistor R1 (a: a, b: gnd) { value 1" + "0".repeat(400) + " Ω }"),
				DesignPackage.Literals.QUANTITY, IssueCodes.VALUE_OUT_OF_RANGE, "is too large to compute with");
		validation.assertError(parse("resistor R1 (a: a, b: gnd) { value 1e400 Ω }"), DesignPackage.Literals.QUANTITY,
				IssueCodes.VALUE_OUT_OF_RANGE, "is too large to compute with");
		validation.assertError(parse("diode D1 (anode: a, cathode: gnd) { saturation 1e-400 A }"),
				DesignPackage.Literals.QUANTITY, IssueCodes.VALUE_OUT_OF_RANGE, "is too small to compute with");
	}

	@Test
	void unitOfTheWrongQuantity() throws Exception {
		validation.assertError(parse("resistor R1 (a: a, b: gnd) { value 10 mA }"), DesignPackage.Literals.QUANTITY,
				IssueCodes.WRONG_UNIT, "value is a resistance (Ω), not a current (A)");
	}

	@Test
	void pinsArePerKind() throws Exception {
		Design d = parse("resistor R1 (plus: a, b: gnd) { value 1 kΩ }");
		validation.assertError(d, DesignPackage.Literals.PIN_BINDING, IssueCodes.UNKNOWN_PIN, "its pins are a, b");
		validation.assertError(d, DesignPackage.Literals.PART, IssueCodes.MISSING_PIN, "leaves pin a unconnected");
	}

	@Test
	void zenerNeedsItsVoltage() throws Exception {
		validation.assertError(parse("zener Z1 (anode: gnd, cathode: a) { }"), DesignPackage.Literals.PART,
				IssueCodes.MISSING_PARAMETER, "needs its breakdown");
		validation.assertNoErrors(parse("zener Z1 (anode: gnd, cathode: a) { breakdown 5.1 V }"));
	}

	@Test
	void transistorPins() throws Exception {
		validation.assertError(parse("pnp Q1 (collector: a, base: a, drain: gnd) { }"), DesignPackage.Literals.PIN_BINDING,
				IssueCodes.UNKNOWN_PIN, "its pins are collector, base, emitter");
	}

	@Test
	void wordsWhereTheKindListsThem() throws Exception {
		validation.assertNoErrors(parse("led D1 (anode: a, cathode: gnd) { colour blue }"));
		validation.assertError(parse("led D1 (anode: a, cathode: gnd) { colour plaid }"), DesignPackage.Literals.PARAMETER,
				IssueCodes.UNKNOWN_WORD, "one of: red, orange");
		validation.assertError(parse("resistor R1 (a: a, b: gnd) { value big }"), DesignPackage.Literals.PARAMETER,
				IssueCodes.UNKNOWN_WORD, "value takes a number");
	}

	@Test
	void potentiometerPositionRunsFromZeroToOne() throws Exception {
		validation.assertNoErrors(parse("potentiometer P1 (a: a, b: gnd, wiper: a) { value 1 kΩ position 0 }"));
		validation.assertError(parse("potentiometer P1 (a: a, b: gnd, wiper: a) { value 1 kΩ position 1.5 }"),
				DesignPackage.Literals.QUANTITY, IssueCodes.VALUE_OUT_OF_RANGE, "position runs from 0");
	}

	@Test
	void unusedAndDanglingNets() throws Exception {
		Design d = parse("net spare\nnet tail\nresistor R1 (a: a, b: tail) { value 1 kΩ }\n"
				+ "resistor R2 (a: a, b: gnd) { value 1 kΩ }");
		validation.assertWarning(d, DesignPackage.Literals.NET, IssueCodes.UNUSED_NET, "'spare' connects no pin");
		validation.assertWarning(d, DesignPackage.Literals.NET, IssueCodes.SINGLE_CONNECTION, "'tail' reaches only one pin");
		// a net with one pin and a terminal is an input, not a dangling wire
		Design input = parse("terminal T1 at tail\nnet tail\nresistor R1 (a: a, b: tail) { value 1 kΩ }\n"
				+ "resistor R2 (a: a, b: gnd) { value 1 kΩ }");
		validation.assertNoIssue(input, DesignPackage.Literals.NET, IssueCodes.SINGLE_CONNECTION);
	}

	@Test
	void designerCases() throws Exception {
		String terminals = "terminal T1 at a\nterminal T2 at gnd\nresistor R1 (a: a, b: gnd) { value 1 kΩ }\n";
		validation.assertNoErrors(parse(terminals + "case \"mains\" { apply -325 V behind 2 Ω from T1 to T2 }\n"
				+ "case \"probe\" { connect 4.7 Ω from T1 to T2 short T1 to T2 }"));
		validation.assertError(parse(terminals + "case \"x\" { apply 5 A from T1 to T2 }"), DesignPackage.Literals.QUANTITY,
				IssueCodes.WRONG_UNIT, "apply takes a voltage");
		validation.assertError(parse(terminals + "case \"x\" { connect 0 Ω from T1 to T2 }"),
				DesignPackage.Literals.QUANTITY, IssueCodes.VALUE_OUT_OF_RANGE);
		validation.assertError(parse(terminals + "case \"x\" { short T1 to T1 }"), DesignPackage.Literals.SHORT,
				IssueCodes.SAME_TERMINAL);
		validation.assertError(parse(terminals + "case \"x\" { short T1 to T9 }"), DesignPackage.Literals.SHORT,
				bulwark.lang.validation.IssueCodes.UNKNOWN_NAME, "T9");
	}

	@Test
	void duplicatePin() throws Exception {
		validation.assertError(parse("resistor R1 (a: a, a: gnd, b: gnd) { value 1 kΩ }"),
				DesignPackage.Literals.PIN_BINDING, IssueCodes.DUPLICATE_PIN);
	}

	@Test
	void requiredParameter() throws Exception {
		validation.assertError(parse("resistor R1 (a: a, b: gnd) { rated power 1 W }"), DesignPackage.Literals.PART,
				IssueCodes.MISSING_PARAMETER, "needs its value");
	}

	@Test
	void unknownParameterAndRating() throws Exception {
		Design d = parse("resistor R1 (a: a, b: gnd) { value 1 kΩ colour 1 V rated current 1 A }");
		validation.assertError(d, DesignPackage.Literals.PARAMETER, IssueCodes.UNKNOWN_PARAMETER);
		validation.assertError(d, DesignPackage.Literals.RATING, IssueCodes.UNKNOWN_RATING, "it has: power, voltage");
	}

	@Test
	void duplicateSetting() throws Exception {
		validation.assertError(parse("resistor R1 (a: a, b: gnd) { value 1 kΩ value 2 kΩ }"),
				DesignPackage.Literals.PARAMETER, IssueCodes.DUPLICATE_SETTING);
	}

	@Test
	void resistanceMustBePositive() throws Exception {
		validation.assertError(parse("resistor R1 (a: a, b: gnd) { value 0 Ω }"), DesignPackage.Literals.QUANTITY,
				IssueCodes.VALUE_OUT_OF_RANGE);
	}

	@Test
	void toleranceRange() throws Exception {
		validation.assertError(parse("resistor R1 (a: a, b: gnd) { value 1 Ω ± 120 % }"),
				DesignPackage.Literals.TOLERANCE, IssueCodes.TOLERANCE_OUT_OF_RANGE);
	}

	@Test
	void namesAreUnique() throws Exception {
		validation.assertError(parse("net R1\nresistor R1 (a: a, b: gnd) { value 1 kΩ }"), DesignPackage.Literals.PART,
				IssueCodes.DUPLICATE_NAME, "already used on line 4");
	}

	@Test
	void referenceNetRequiredAndUnique() throws Exception {
		Design none = parser.parse("design \"t\"\nnet a\n");
		validation.assertError(none, DesignPackage.Literals.DESIGN, IssueCodes.NO_REFERENCE_NET);
		Design two = parse("reference net gnd2\n");
		validation.assertError(two, DesignPackage.Literals.NET, IssueCodes.MANY_REFERENCE_NETS);
	}

	@Test
	void undeclaredNetIsALinkingError() throws Exception {
		validation.assertError(parse("resistor R1 (a: nowhere, b: gnd) { value 1 kΩ }"),
				DesignPackage.Literals.PIN_BINDING, bulwark.lang.validation.IssueCodes.UNKNOWN_NAME, "nowhere");
	}
}
