package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import bulwark.check.rules.PartLimitRule;
import bulwark.check.rules.Rule;
import bulwark.check.rules.RuleRegistry;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.lang.design.PartKind;
import bulwark.lang.kinds.KindCatalog;

/**
 * The three tables that name ratings agree: every rating rule's stress, for every kind it checks, is one of
 * that kind's stresses, and every stress is named after a rating the language lets that kind write — so a
 * rating rule never looks for a stress or a rating that is not there.
 */
class StressCatalogueTest {
	@Test
	void everyRatingRuleComparesAStressTheKindHas() {
		List<String> wrong = new ArrayList<>();
		int checked = 0;
		for (Rule rule : RuleRegistry.all()) {
			if (rule instanceof PartLimitRule r) {
				for (PartKind kind : r.kinds()) {
					Measure m = r.measure(kind);
					checked++;
					if (!StressCatalog.of(kind).contains(m)) {
						wrong.add(r.info().id() + " compares " + m.rating() + ", which " + kind + " has no stress for");
					}
				}
			}
		}
		assertTrue(checked > 20, "the rating rules were not found");
		assertEquals(List.of(), wrong);
	}

	@Test
	void everyStressIsNamedAfterARatingTheKindCanWrite() {
		List<String> wrong = new ArrayList<>();
		for (PartKind kind : PartKind.values()) {
			for (Measure m : StressCatalog.of(kind)) {
				boolean written = KindCatalog.of(kind).ratings().stream().anyMatch(s -> s.name().equals(m.rating()));
				if (!written) {
					wrong.add(kind + " has a stress '" + m.rating() + "' but no rating of that name");
				}
			}
		}
		assertEquals(List.of(), wrong);
	}
}
