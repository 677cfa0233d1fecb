package bulwark.lang.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.eclipse.xtext.testing.validation.ValidationTestHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

import com.google.inject.Inject;

import bulwark.lang.design.Document;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.validation.IssueCodes;

/** Review policy entries; one snippet triggers each code, one does not. */
@ExtendWith(InjectionExtension.class)
@InjectWith(BulwarkInjectorProvider.class)
class PolicyValidationTest {
	@Inject
	private ParseHelper<Document> parser;
	@Inject
	private ValidationTestHelper validation;

	private Document parse(String body) throws Exception {
		return parser.parse("policy \"p\"\n" + body);
	}

	@Test
	void aCompletePolicyIsValid() throws Exception {
		validation.assertNoErrors(parse("""
				mains 230 V ± 10 %
				mains 120 V ± 10 %
				level 48 V
				surge 2 kV behind 12 Ω
				derate capacitor voltage to 50 %
				derate npn collector_emitter to 75 %
				minimum hysteresis 0.5 Ω
				severity "hysteresis" error
				waivers need justification and name
				"""));
		validation.assertNoErrors(parse("mains none\nwaivers need nothing"));
	}

	@Test
	void deratingOfARatingTheKindHasNot() throws Exception {
		validation.assertError(parse("derate capacitor power to 50 %"), DesignPackage.Literals.DERATING,
				IssueCodes.UNKNOWN_RATING, "A capacitor has no rating 'power'; it has: voltage");
		validation.assertError(parse("derate capacitor voltage to 0 %"), DesignPackage.Literals.DERATING,
				IssueCodes.VALUE_OUT_OF_RANGE, "more than 0 %");
	}

	@Test
	void aWrongDeratingIsReportedOnce() throws Exception {
		long wrong = validation.validate(parse("derate capacitor power to 50 %")).stream()
				.filter(i -> i.getMessage().contains("has no rating 'power'")).count();
		assertEquals(1, wrong);
	}

	/** A derating is not a tolerance: the advice names what was being written. */
	@Test
	void aDeratingInAUnitIsToldItIsAPercentage() throws Exception {
		var errors = parse("derate resistor power to 60 V").eResource().getErrors();
		assertEquals(1, errors.size(), errors.toString());
		assertEquals("a derating is a percentage of the rating: write to 60 %", errors.get(0).getMessage());
	}

	/** A kind misspelt after derate is named as such, with the nearest kind; not "cannot start a statement". */
	@Test
	void aMisspeltKindInADeratingIsNamed() throws Exception {
		var errors = parse("derate resistr power to 60 %").eResource().getErrors();
		assertEquals("'resistr' is not a part kind (did you mean 'resistor'?): write derate KIND RATING to P %, as in "
				+ "derate resistor power to 60 %", errors.get(0).getMessage(), errors.toString());
	}

	@Test
	void quantitiesInTheirUnits() throws Exception {
		validation.assertError(parse("mains 230 A"), DesignPackage.Literals.MAINS_SYSTEM, IssueCodes.WRONG_UNIT,
				"mains takes a voltage");
		validation.assertError(parse("surge 1 kV behind 2 V"), DesignPackage.Literals.SURGE, IssueCodes.WRONG_UNIT,
				"behind takes a resistance");
		validation.assertError(parse("minimum hysteresis 5 A"), DesignPackage.Literals.MINIMUM, IssueCodes.WRONG_UNIT,
				"minimum hysteresis");
	}

	@Test
	void severitiesAndWaiverDemands() throws Exception {
		validation.assertError(parse("severity \"hysteresis\" off"), DesignPackage.Literals.SEVERITY_CHANGE,
				IssueCodes.UNKNOWN_WORD, "never switched off");
		validation.assertError(parse("waivers need signature"), DesignPackage.Literals.WAIVER_DEMAND,
				IssueCodes.UNKNOWN_WORD, "justification, name, nothing");
	}
}
