package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.xtext.util.CancelIndicator;
import org.junit.jupiter.api.Test;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.Status;
import bulwark.check.rules.CheckContext;
import bulwark.check.rules.FigureRule;
import bulwark.check.rules.ResistorPowerRule;
import bulwark.check.rules.Rule;
import bulwark.check.finding.RuleInfo;
import bulwark.check.rules.RuleRegistry;

/**
 * A rule that crashes must fail its fixtures, both the one that triggers and the one that must stay silent:
 * the checker reports the crash as an "internal" finding (so that a batch goes on), and the fixtures refuse
 * that finding.
 */
class CrashIsNeverAPassTest {
	/** A rule that crashes on every design, listed after the registered ones. */
	private static final Rule CRASHING = new FigureRule() {
		@Override
		public RuleInfo info() {
			return RuleRegistry.all().get(0).info();
		}

		@Override
		public void check(CheckContext context, Consumer<Finding> findings) {
			throw new IllegalStateException("a fault planted by the test");
		}
	};

	private static DesignResult checkWithCrash(String text) {
		List<Rule> rules = new ArrayList<>(RuleRegistry.all());
		rules.add(CRASHING);
		DesignChecker crashing = Fixtures.checker().withRules(rules);
		return crashing.check(text, "fixture.bulwark", CancelIndicator.NullImpl);
	}

	/** Fails unless the guard refuses (the bundle imports no JUnit function types, so no assertThrows). */
	private static void assertRefused(Runnable guard) {
		try {
			guard.run();
		} catch (AssertionError expected) {
			return;
		}
		throw new AssertionError("the fixture guard let a crashed check through");
	}

	@Test
	void theCheckerReportsTheCrashAsNotChecked() {
		DesignResult r = checkWithCrash(ResistorPowerRuleTest.WITHIN);
		assertEquals(Status.ERROR, r.status());
		assertEquals("internal", r.findings().get(0).rule().text());
		assertTrue(r.findings().get(0).message().contains("a fault planted by the test"), r.findings().toString());
	}

	@Test
	void aCrashFailsTheSilentFixture() {
		DesignResult r = checkWithCrash(ResistorPowerRuleTest.WITHIN);
		assertRefused(() -> Fixtures.assertSilent(r, ResistorPowerRule.ID));
	}

	@Test
	void aCrashFailsTheTriggeringFixture() {
		DesignResult r = checkWithCrash(ResistorPowerRuleTest.OVER);
		assertRefused(() -> Fixtures.untroubled(r));
	}

	@Test
	void withoutTheCrashBothFixturesHold() {
		// the same fixtures, checked by the registered rules only: the guard itself does not fail them
		DesignResult within = Fixtures.checker().withRules(RuleRegistry.all()).check(ResistorPowerRuleTest.WITHIN,
				"fixture.bulwark", CancelIndicator.NullImpl);
		Fixtures.assertSilent(within, ResistorPowerRule.ID);
		DesignResult over = Fixtures.check(ResistorPowerRuleTest.OVER);
		assertEquals(Fixtures.expected(ResistorPowerRuleTest.OVER, ResistorPowerRule.ID),
				Fixtures.actual(over, ResistorPowerRule.ID));
	}
}
