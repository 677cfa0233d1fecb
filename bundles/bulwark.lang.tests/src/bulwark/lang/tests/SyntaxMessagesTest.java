package bulwark.lang.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.validation.CheckMode;
import org.eclipse.xtext.validation.Issue;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

import com.google.inject.Inject;
import com.google.inject.Provider;

import bulwark.lang.diagnostics.FirstSyntaxErrors;

/**
 * The common mistakes of the language, each with the one message a user sees for it, at its line and column:
 * in Bulwark's words, saying what to write, and never more than one for a broken statement. The phrases of
 * the parser generator and the language framework (see {@link #STOCK}) never appear.
 */
@ExtendWith(InjectionExtension.class)
@InjectWith(BulwarkInjectorProvider.class)
class SyntaxMessagesTest {
	/** Words of the libraries underneath that must never reach a user. */
	static final List<String> STOCK = List.of("mismatched input", "mismatched character", "no viable alternative",
			"missing RULE", "RULE_", "extraneous input", "expecting", "<EOF>", "missing EOF", "Couldn't resolve reference",
			"'null'");

	private static final String HEAD = "design \"x\"\nreference net gnd\nnet a\nterminal T at a\n";
	private static final String PART = "resistor R1 (a: a, b: gnd) ";

	/** A mistake, the message it must give and where (line and column, counted from 1). */
	private record Mistake(String text, String message, int line, int column) {
	}

	private static Mistake inHead(String line5, String message, int column) {
		return inHead(line5, message, 5, column);
	}

	private static Mistake inHead(String lines, String message, int line, int column) {
		return new Mistake(HEAD + lines + "\n", message, line, column);
	}

	private static final List<Mistake> MISTAKES = List.of(
			// numbers and units
			inHead(PART + "{ value 2.7k }", "'k' after 2.7 is only a prefix: write the unit too, for example 2.7 kΩ", 41),
			inHead(PART + "{ value 5 volts }", "'volts' after 5 is not a unit Bulwark knows; units are Ω (or ohm), V, A, W,"
					+ " Ah, A²s, F, H, s, h, Hz, J, with the prefixes a f p n µ m k M G T", 44),
			inHead(PART + "{ value 1,5 kΩ }", "decimals are written with '.', not ',': write 1.5", 37),
			inHead(PART + "{ value = 1 kΩ }", "settings take no '=': write the name, then the value, as in value 10 kΩ", 36),
			inHead(PART + "{ value 1 kΩ ± 1 }", "a tolerance is a percentage: write ± 1 %", 45),
			inHead(PART + "{ value 1 kΩ ± 1 % rated power }",
					"'power' needs its value here, a number with its unit (for example 250 mW), not '}'", 59),
			inHead(PART + "{ value 1 kΩ rated 125 mW }",
					"'rated' is followed by the rating's name, then its value: write rated power 250 mW", 47),
			inHead(PART + "{ rated 125 mW value 1 kΩ }",
					"'rated' is followed by the rating's name, then its value: write rated power 250 mW", 36),
			// blocks and lists
			new Mistake(HEAD + PART + "{ value 1 kΩ\nnet b\n",
					"the settings of R1, opened with '{' at 5:28, are not closed: add '}' before 'net' on line 6", 6, 1),
			new Mistake(HEAD + PART + "{ value 1 kΩ rated power 125 mW",
					"the settings of R1, opened with '{' at 5:28, are not closed: add '}' at its end", 5, 57),
			new Mistake(HEAD + "case \"on\" { apply 5 V from T to T\nnet b\n",
					"the actions of case \"on\", opened with '{' at 5:11, are not closed: add '}' before 'net' on line 6", 6, 1),
			new Mistake(HEAD + "define resistor CHIP { package 0805\nnet b\n",
					"the settings of definition CHIP, opened with '{' at 5:22, are not closed: add '}' before 'net' on line 6",
					6, 1),
			inHead(PART + "{ value 1 kΩ } }", "this '}' closes no block: delete it", 43),
			inHead("resistor R1 (a: a, b: gnd)) { value 1 kΩ }", "this ')' closes no pin list: delete it", 27),
			inHead("resistor R1 (a: a b: gnd) { value 1 kΩ }", "pins are separated by ',': add ',' before 'b'", 19),
			inHead("resistor R1 (a a, b: gnd) { value 1 kΩ }", "a pin and its net are joined by ':': write a: net", 16),
			inHead("resistor R1 a, b { value 1 kΩ }",
					"a part's pins follow its name, in parentheses: write R1 (a: net1, b: net2) with the pins of its kind", 13),
			inHead("resistor R1 (a: a, b: gnd { value 1 kΩ }",
					"the pin list opened with '(' at 5:13 is not closed: add ')' before '{'", 27),
			// statements
			inHead("resistr R1 (a: a, b: gnd) { value 1 kΩ }", "'resistr' cannot start a statement (did you mean 'resistor'?);"
					+ " statements start with net, terminal, a kind of part (resistor, diode, comparator, …), case, define,"
					+ " require, waive or use", 1),
			inHead("diod D1 (anode: a, cathode: gnd)", "'diod' cannot start a statement (did you mean 'diode'?); statements"
					+ " start with net, terminal, a kind of part (resistor, diode, comparator, …), case, define, require,"
					+ " waive or use", 1),
			inHead("terminl T2 at a", "'terminl' cannot start a statement (did you mean 'terminal'?); statements start with"
					+ " net, terminal, a kind of part (resistor, diode, comparator, …), case, define, require, waive or use", 1),
			inHead("wire a to gnd", "'wire' cannot start a statement; statements start with net, terminal, a kind of part"
					+ " (resistor, diode, comparator, …), case, define, require, waive or use", 1),
			inHead("42", "'42' cannot start a statement; statements start with net, terminal, a kind of part (resistor,"
					+ " diode, comparator, …), case, define, require, waive or use", 1),
			inHead("// a comment", "comments start with '#': write # in place of //", 1),
			inHead("net b;", "';' is not part of the language: a statement ends where the next one begins; delete it", 6),
			inHead("net 1b", "a name starts with a letter or '_', not a digit: '1b' cannot be one", 5),
			inHead("net led", "'led' is a word of the language and cannot be a name as it is; write ^led to use it as one", 5),
			inHead("net case", "'case' is a word of the language and cannot be a name as it is; write ^case to use it as one", 5),
			inHead("terminal T2 a", "a terminal names its net after 'at': write terminal NAME at a", 13),
			inHead("terminal T2", "a terminal names its net after 'at': write terminal NAME at net", 12),
			// texts
			new Mistake("design x\nreference net gnd\n", "a design's title is a text in double quotes: write design \"x\"", 1, 8),
			new Mistake("design \"x\nreference net gnd\n", "this text is not closed: add '\"' before the end of its line", 1, 8),
			inHead("case on { apply 5 V from T to T }", "a case's name is a text in double quotes: write case \"on\"", 6),
			inHead("waive resistor-power on R1 because \"ok\" by \"me\" on \"2026-12-03\"",
					"the rule's name is a text in double quotes: write waive \"resistor\"", 7),
			new Mistake("design \"x\"\nuse lib\nreference net gnd\n", "the library's file is a text in double quotes: write use \"lib\"", 2, 5),
			inHead("use \"lib.bulwark\"", "'use' belongs to the design's heading: move it up, after the title and before the first"
					+ " net, part or case", 1),
			// cases
			inHead("case \"on\" { apply 5 V T to T }", "the terminals are named as 'from A to B': add 'from' before 'T'", 23),
			inHead("case \"on\" { apply 5 V from T T }", "the terminals are named as 'from A to B': add 'to' before 'T'", 30),
			inHead("case \"on\" { put 5 V from T to T }", "'put' does not fit after '{': a case's actions are apply, connect and short",
					13),
			// names that refer to nothing
			inHead("resistor R1 (a: X, b: gnd) { value 1 kΩ }", "no net 'X' in this design", 17),
			inHead("resistor R1 (a: aa, b: gnd) { value 1 kΩ }", "no net 'aa' in this design", 17),
			inHead("resistor R1 (a: gdn, b: a) { value 1 kΩ }", "no net 'gdn' in this design (did you mean 'gnd'?)", 17),
			inHead("case \"on\" { apply 5 V from T to Q }", "no terminal 'Q' in this design", 33),
			inHead("resistor R1 (a: a, b: gnd) is CHIP { value 1 kΩ }",
					"no definition 'CHIP' in this design or the libraries it uses", 31),
			inHead("resistor R1 (a: a, b: gnd) { value 1 kΩ }\nwaive \"resistor-power\" on R2 because \"ok\" by \"me\" on \"2026-12-03\"",
					"no part 'R2' in this design", 6, 27),
			inHead("resistor RIN (a: a, b: gnd) { value 1 kΩ }\nwaive \"resistor-power\" on RIM because \"ok\" by \"me\" on"
					+ " \"2026-12-03\"", "no part 'RIM' in this design (did you mean 'RIN'?)", 6, 27));

	@Inject
	private Provider<XtextResourceSet> resourceSets;

	@Test
	void eachCommonMistakeHasItsOneMessage() throws Exception {
		assertTrue(MISTAKES.size() >= 40, "the table must cover the common mistakes: " + MISTAKES.size());
		List<String> wrong = new ArrayList<>();
		for (Mistake m : MISTAKES) {
			List<Issue> errors = errors(m.text());
			String got = errors.stream().map(i -> i.getLineNumber() + ":" + i.getColumn() + " " + i.getMessage()).toList()
					.toString();
			if (errors.size() != 1) {
				wrong.add(m.text() + "\n  expected one error, got " + got);
				continue;
			}
			Issue e = errors.get(0);
			if (!e.getMessage().equals(m.message()) || e.getLineNumber() != m.line() || e.getColumn() != m.column()) {
				wrong.add(m.text() + "\n  expected " + m.line() + ":" + m.column() + " " + m.message() + "\n  got      " + got);
			}
			if (e.getCode() == null || !e.getCode().startsWith("bulwark.lang.")) {
				wrong.add(m.text() + "\n  code " + e.getCode() + " is not one of Bulwark's");
			}
		}
		assertTrue(wrong.isEmpty(), wrong.size() + " of " + MISTAKES.size() + " wrong:\n" + String.join("\n", wrong));
	}

	@Test
	void noMessageUsesTheWordsOfTheLibrariesUnderneath() throws Exception {
		for (Mistake m : MISTAKES) {
			for (Issue i : errors(m.text())) {
				for (String stock : STOCK) {
					assertTrue(!i.getMessage().contains(stock), "'" + stock + "' in: " + i.getMessage());
				}
			}
		}
	}

	@Test
	void aBrokenStatementDoesNotHideTheNextOne() throws Exception {
		// two broken statements, each reported once, in order
		List<Issue> errors = errors(HEAD + PART + "{ value 2.7k }\nnet 1b\n");
		assertEquals(2, errors.size(), errors.toString());
		assertEquals(5, errors.get(0).getLineNumber());
		assertEquals(6, errors.get(1).getLineNumber());
	}

	/** Parses and validates as the check does, with the cascade of each broken statement dropped. */
	private List<Issue> errors(String text) throws Exception {
		XtextResourceSet set = resourceSets.get();
		XtextResource resource = (XtextResource) set.createResource(URI.createURI("mistake.bulwark"));
		resource.load(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)),
				Map.of(XtextResource.OPTION_ENCODING, StandardCharsets.UTF_8.name()));
		List<Issue> all = resource.getResourceServiceProvider().getResourceValidator().validate(resource, CheckMode.ALL,
				CancelIndicator.NullImpl);
		return FirstSyntaxErrors.of(resource, all).stream()
				.filter(i -> i.getSeverity() == org.eclipse.xtext.diagnostics.Severity.ERROR).toList();
	}
}
