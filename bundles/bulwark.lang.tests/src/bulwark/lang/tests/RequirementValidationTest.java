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

/** Requirements: each figure in a unit of its quantity, each stated once; one snippet triggers, one does not. */
@ExtendWith(InjectionExtension.class)
@InjectWith(BulwarkInjectorProvider.class)
class RequirementValidationTest {
	@Inject
	private ParseHelper<Design> parser;
	@Inject
	private ValidationTestHelper validation;

	private Design parse(String body) throws Exception {
		return parser.parse("design \"t\"\nreference net gnd\nnet tip\nterminal TIP at tip\nterminal COM at gnd common\n"
				+ "resistor R1 (a: tip, b: gnd) { value 1 kΩ }\n" + body);
	}

	@Test
	void everyFigureInItsUnit() throws Exception {
		validation.assertNoErrors(parse("""
				require threshold 5 Ω between TIP and COM
				require test_current 20 mA
				require standby_current 5 µA
				require battery_life 8766 h
				require hysteresis 20 mV
				require led_test 3.2 V
				"""));
	}

	@Test
	void unknownFigure() throws Exception {
		validation.assertError(parse("require brightness 5 V"), DesignPackage.Literals.REQUIREMENT,
				IssueCodes.UNKNOWN_REQUIREMENT, "A design can require: battery_life, hysteresis");
	}

	@Test
	void wrongUnit() throws Exception {
		validation.assertError(parse("require threshold 5 V"), DesignPackage.Literals.REQUIREMENT, IssueCodes.WRONG_UNIT,
				"threshold is written in Ω, not voltage");
		validation.assertError(parse("require battery_life 12"), DesignPackage.Literals.REQUIREMENT,
				IssueCodes.MISSING_UNIT, "battery_life is written in h");
	}

	@Test
	void eachProblemIsReportedOnce() throws Exception {
		// the composed validators run once, through BulwarkValidator, not also registered on their own
		long wrong = validation.validate(parse("require threshold 5 V")).stream()
				.filter(i -> i.getMessage().contains("threshold is written in Ω")).count();
		assertEquals(1, wrong);
	}

	@Test
	void statedOnce() throws Exception {
		validation.assertError(parse("require test_current 20 mA\nrequire test_current 10 mA"),
				DesignPackage.Literals.REQUIREMENT, IssueCodes.DUPLICATE_REQUIREMENT, "required twice");
		validation.assertNoErrors(parse("require hysteresis 20 mV\nrequire hysteresis 1 Ω"));
	}

	@Test
	void betweenTwoTerminals() throws Exception {
		validation.assertError(parse("require threshold 5 Ω between TIP and TIP"), DesignPackage.Literals.REQUIREMENT,
				IssueCodes.SAME_TERMINAL, "two different terminals");
	}
}
