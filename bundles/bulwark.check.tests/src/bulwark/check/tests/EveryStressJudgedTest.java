package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import bulwark.check.rules.PartLimitRule;
import bulwark.check.rules.Rule;
import bulwark.check.rules.RuleRegistry;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.lang.design.PartKind;

/**
 * Every stress a part kind has (the stress catalogue, which the JSON and the stress bars show against the
 * part's rating) is judged by a rule: a rating that a stress exceeds with no rule to say so would be a
 * silent pass, the bar red and the design passed.
 */
class EveryStressJudgedTest {
	@Test
	void eachStressOfEachKindHasItsRule() {
		List<String> unjudged = new ArrayList<>();
		for (PartKind kind : PartKind.VALUES) {
			for (Measure m : StressCatalog.of(kind)) {
				boolean judged = false;
				for (Rule r : RuleRegistry.all()) {
					judged |= r instanceof PartLimitRule p && p.kinds().contains(kind) && p.measure(kind) == m;
				}
				if (!judged) {
					unjudged.add(kind.getLiteral() + " " + m.rating());
				}
			}
		}
		assertEquals(List.of(), unjudged, "stresses no rule judges");
	}
}
