package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

import bulwark.check.rules.Rule;
import bulwark.check.rules.RuleRegistry;

/** Every rule has its three parts: the class, its explanation in docs/rules/ID.md, and a test class. */
class RuleCatalogueTest {
	private static final List<String> SECTIONS = List.of("## What", "## Why", "## How it is computed", "## Source",
			"## Example");

	@Test
	void everyRuleHasExplanationAndTest() throws IOException {
		Set<String> ids = new HashSet<>();
		for (Rule rule : RuleRegistry.all()) {
			String id = rule.info().id().text();
			assertTrue(ids.add(id), "duplicate rule ID " + id);
			Path doc = Fixtures.root().resolve("docs/rules/" + id + ".md");
			assertTrue(Files.isRegularFile(doc), "missing explanation " + doc);
			String text = Files.readString(doc);
			for (String section : SECTIONS) {
				assertTrue(text.contains(section), doc + " lacks section " + section);
			}
			String testName = RuleCatalogueTest.class.getPackageName() + "." + rule.getClass().getSimpleName() + "Test";
			try {
				Class.forName(testName);
			} catch (ClassNotFoundException e) {
				throw new AssertionError("rule " + id + " has no test class " + testName);
			}
		}
		String catalogue = Files.readString(Fixtures.root().resolve("docs/rule-catalogue.md"));
		for (String id : ids) {
			assertTrue(catalogue.contains("rules/" + id + ".md"), "catalogue does not list " + id);
		}
		assertEquals(ids.size(), RuleRegistry.all().size());
	}
}
