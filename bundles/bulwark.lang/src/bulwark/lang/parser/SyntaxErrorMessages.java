package bulwark.lang.parser;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.antlr.runtime.EarlyExitException;
import org.antlr.runtime.MismatchedTokenException;
import org.antlr.runtime.NoViableAltException;
import org.antlr.runtime.RecognitionException;
import org.antlr.runtime.Token;
import org.antlr.runtime.TokenStream;
import org.antlr.runtime.UnwantedTokenException;
import org.eclipse.xtext.nodemodel.SyntaxErrorMessage;
import org.eclipse.xtext.parser.antlr.SyntaxErrorMessageProvider;

import bulwark.lang.design.PartKind;
import bulwark.lang.naming.Suggestion;
import bulwark.lang.parser.antlr.internal.InternalBulwarkParser;
import bulwark.lang.units.UnitParser;
import bulwark.lang.validation.IssueCodes;

/**
 * Every syntax error in the language's own terms: what was expected where, and how to write it. The parser
 * generator's own sentences never reach a user; its exception says which token it met and which it wanted,
 * and the tokens around it say which statement it was in. The lexer reports only a sentence, from which the
 * character it could not read is taken.
 */
public class SyntaxErrorMessages extends SyntaxErrorMessageProvider {
	private static final Pattern LEXER_CHARACTER = Pattern.compile("at character '(.*)'$");
	private static final Pattern UNCLOSED_TEXT = Pattern.compile("^mismatched character '.*' expecting '\"'$");

	private static final int CLOSE_BRACE = type("'}'"), OPEN_PAREN = type("'('"), CLOSE_PAREN = type("')'"),
			COLON = type("':'"), PERCENT = type("'%'"), AT = type("'at'"), FROM = type("'from'"), TO = type("'to'");

	/** A keyword's token type, by its name in the generated parser. */
	private static int type(String keyword) {
		String[] names = InternalBulwarkParser.tokenNames;
		for (int i = 0; i < names.length; i++) {
			if (names[i].equals(keyword)) {
				return i;
			}
		}
		throw new IllegalStateException("the grammar has no keyword " + keyword);
	}

	/** What a design's statements start with, for the message about a line that starts with none of them. */
	static final String DESIGN_STATEMENTS = "statements start with net, terminal, a kind of part (resistor, diode, "
			+ "comparator, …), case, define, require, waive or use";
	static final String POLICY_ENTRIES = "a policy's entries start with mains, level, surge, derate, minimum, severity, "
			+ "waivers or distribution";

	@Override
	public SyntaxErrorMessage getSyntaxErrorMessage(IParserErrorContext context) {
		RecognitionException e = context.getRecognitionException();
		if (e == null) {
			return new SyntaxErrorMessage(lexical(context.getDefaultMessage()), IssueCodes.SYNTAX);
		}
		if (!(e.input instanceof TokenStream tokens) || e.token == null) {
			return new SyntaxErrorMessage("Bulwark cannot read the text here; see the language reference (docs/language.md)",
					IssueCodes.SYNTAX);
		}
		Token found = e.token;
		Token before = previousVisible(tokens, found.getTokenIndex() < 0 ? tokens.size() : found.getTokenIndex());
		if (before != null && text(before).equals("derate") && PartKind.get(text(found)) == null && isName(found)) {
			List<String> kinds = PartKind.VALUES.stream().map(PartKind::getLiteral).toList();
			return new SyntaxErrorMessage("'" + text(found) + "' is not a part kind"
					+ bulwark.lang.naming.Suggestion.didYouMean(text(found), kinds)
					+ ": write derate KIND RATING to P %, as in derate resistor power to 60 %", IssueCodes.SYNTAX);
		}
		SyntaxErrorMessage unit = afterNumber(tokens, found, before);
		if (unit != null) {
			return unit;
		}
		// a name is a word or a unit symbol (the grammar's Name rule): where one was wanted, the parser saw no
		// alternative, and that is told as a missing name
		int expected = e instanceof MismatchedTokenException m ? m.expecting
				: e instanceof NoViableAltException && nameFollows(before) ? InternalBulwarkParser.RULE_ID : -1;
		if (expected == InternalBulwarkParser.RULE_ID && isWord(found)) {
			return new SyntaxErrorMessage("'" + found.getText() + "' is a word of the language and cannot be a name as it is;"
					+ " write ^" + found.getText() + " to use it as one", IssueCodes.KEYWORD_AS_NAME);
		}
		return new SyntaxErrorMessage(parser(e, tokens, found, before, expected), IssueCodes.SYNTAX);
	}

	/** A word or a unit symbol as the lexer made it: what a name could be. */
	private static boolean isName(Token t) {
		return t.getType() == InternalBulwarkParser.RULE_ID || t.getType() == InternalBulwarkParser.RULE_UNIT;
	}

	/**
	 * Whether a name comes after this token: a net's, a terminal's, a part's or a definition's, or a reference to
	 * one (names are a word or a unit symbol, so a keyword found there is not reported as a missing ID).
	 */
	private static boolean nameFollows(Token before) {
		if (before == null) {
			return false;
		}
		String t = text(before);
		return PartKind.get(t) != null || List.of("net", "terminal", "is", "from", "between", "and", "on", "short", ":")
				.contains(t);
	}

	/** A lexer's complaint, from its sentence: which character, or a text left open. */
	static String lexical(String lexerSentence) {
		String sentence = lexerSentence == null ? "" : lexerSentence;
		if (UNCLOSED_TEXT.matcher(sentence).matches()) {
			return "this text is not closed: add '\"' before the end of its line";
		}
		Matcher m = LEXER_CHARACTER.matcher(sentence);
		String c = m.find() ? m.group(1) : "";
		switch (c) {
		case "/":
			return "comments start with '#': write # in place of //";
		case ";":
			return "';' is not part of the language: a statement ends where the next one begins; delete it";
		case "=":
			return "settings take no '=': write the name, then the value, as in value 10 kΩ";
		case "\"":
			return "this text is not closed: add '\"' before the end of its line";
		case "":
			return "Bulwark cannot read the text here; names are letters, digits and '_', texts go in double quotes"
					+ " and comments start with '#'";
		default:
			return "'" + c + "' is not a character of the language; names are letters, digits and '_', texts go in"
					+ " double quotes and comments start with '#'";
		}
	}

	private static String parser(RecognitionException e, TokenStream tokens, Token found, Token before, int expected) {
		String after = before == null ? "at the start of the file" : "after '" + text(before) + "'";
		if (expected == Token.EOF || (e instanceof UnwantedTokenException u && u.expecting == Token.EOF)) {
			return cannotStart(tokens, found);
		}
		if (expected == CLOSE_BRACE) {
			if (before != null && before.getType() == InternalBulwarkParser.RULE_NUMBER && text(found).equals(",")) {
				return "decimals are written with '.', not ',': write " + text(before) + "." + nextText(tokens, found);
			}
			Token open = unclosed(tokens, index(tokens, found), "{", "}");
			if (open != null && (TokenWords.isEnd(found) || startsStatement(found))) {
				return blockOf(tokens, open) + ", opened with '{' at " + at(open) + ", are not closed: add '}'"
						+ (TokenWords.isEnd(found) ? " at its end" : " before " + TokenWords.found(found) + " on line "
								+ found.getLine());
			}
			return TokenWords.found(found) + " does not fit " + after + ": " + blockAdvice(tokens, found);
		}
		if (expected == CLOSE_PAREN) {
			if (found.getType() == InternalBulwarkParser.RULE_ID || text(found).equals("source")) {
				return "pins are separated by ',': add ',' before " + TokenWords.found(found);
			}
			Token open = unclosed(tokens, index(tokens, found), "(", ")");
			if (open != null) {
				return "the pin list opened with '(' at " + at(open) + " is not closed: add ')' before "
						+ TokenWords.found(found);
			}
		}
		if (expected == COLON) {
			return "a pin and its net are joined by ':': write " + (before == null ? "pin" : text(before)) + ": net";
		}
		if (expected == OPEN_PAREN) {
			return "a part's pins follow its name, in parentheses: write " + (before == null ? "R1" : text(before))
					+ " (a: net1, b: net2) with the pins of its kind";
		}
		if (expected == InternalBulwarkParser.RULE_STRING) {
			String what = before == null ? "" : switch (text(before)) {
			case "design", "policy", "library" -> "a " + text(before) + "'s title";
			case "case" -> "a case's name";
			case "waive", "severity" -> "the rule's name";
			case "use" -> "the library's file";
			case "because" -> "the reason";
			case "by" -> "who accepted it";
			case "on" -> "the date";
			default -> "";
			};
			String example = TokenWords.isEnd(found) ? "\"…\"" : "\"" + text(found) + "\"";
			return (what.isEmpty() ? "a text in double quotes is needed " + after : what + " is a text in double quotes")
					+ ": write " + (before == null ? "" : text(before) + " ") + example;
		}
		if (expected == InternalBulwarkParser.RULE_ID) {
			if (before != null && text(before).equals("rated")) {
				return "'rated' is followed by the rating's name, then its value: write rated power 250 mW";
			}
			if (found.getType() == InternalBulwarkParser.RULE_NUMBER) {
				// the lexer splits "1b" into a number and a name: show the word as written
				Token rest = nextVisible(tokens, index(tokens, found));
				boolean joined = rest != null && found instanceof org.antlr.runtime.CommonToken f
						&& rest instanceof org.antlr.runtime.CommonToken r && r.getStartIndex() == f.getStopIndex() + 1;
				String word = text(found) + (joined ? text(rest) : "");
				return "a name starts with a letter or '_', not a digit: '" + word + "' cannot be one";
			}
			return "a name is needed " + after + ", not " + TokenWords.found(found);
		}
		if (expected == InternalBulwarkParser.RULE_NUMBER) {
			return (before == null ? "a value" : "'" + text(before) + "'")
					+ " needs its value here, a number with its unit (for example 250 mW), not " + TokenWords.found(found);
		}
		if (expected == PERCENT) {
			// the word before the number says which percentage: a derating ("to 60"), a tolerance ("± 1")
			Token word = before == null ? null : previousVisible(tokens, index(tokens, before));
			String number = before == null ? "1" : text(before);
			if (word != null && text(word).equals("to")) {
				return "a derating is a percentage of the rating: write to " + number + " %";
			}
			return "a tolerance is a percentage: write ± " + number + " %";
		}
		if (expected == AT) {
			return "a terminal names its net after 'at': write terminal NAME at " + (TokenWords.isEnd(found) ? "net"
					: text(found));
		}
		if (expected == FROM || expected == TO) {
			return "the terminals are named as 'from A to B': add '" + TokenWords.expected(expected).replace("'", "")
					+ "' before " + TokenWords.found(found);
		}
		if (e instanceof UnwantedTokenException) {
			return TokenWords.found(found) + " is not expected " + after + ": delete it";
		}
		if (e instanceof NoViableAltException) {
			if (unclosed(tokens, index(tokens, found), "{", "}") != null) {
				return TokenWords.found(found) + " does not fit " + after + ": " + blockAdvice(tokens, found);
			}
			return TokenWords.found(found) + " does not fit " + after;
		}
		if (e instanceof EarlyExitException) {
			return "something is missing " + after + ", before " + TokenWords.found(found);
		}
		if (expected >= 0) {
			return TokenWords.expected(expected) + " is needed " + after + ", not " + TokenWords.found(found);
		}
		return TokenWords.found(found) + " does not fit " + after;
	}

	/** A token at the top level that no statement starts with. */
	private static String cannotStart(TokenStream tokens, Token found) {
		boolean policy = text(firstVisible(tokens)).equals("policy");
		String list = policy ? POLICY_ENTRIES : DESIGN_STATEMENTS;
		switch (text(found)) {
		case "use", "purpose", "revision", "policy":
			if (!policy) {
				return "'" + text(found) + "' belongs to the design's heading: move it up, after the title and before the"
						+ " first net, part or case";
			}
			break;
		default:
			break;
		}
		switch (text(found)) {
		case "}":
			return "this '}' closes no block: delete it";
		case ")":
			return "this ')' closes no pin list: delete it";
		default:
			String hint = found.getType() == InternalBulwarkParser.RULE_ID
					? Suggestion.didYouMean(text(found), statementWords(policy))
					: "";
			return TokenWords.found(found) + " cannot start a statement" + hint + "; " + list;
		}
	}

	private static List<String> statementWords(boolean policy) {
		List<String> words = new ArrayList<>();
		if (policy) {
			words.addAll(List.of("mains", "level", "surge", "derate", "minimum", "severity", "waivers", "distribution"));
		} else {
			words.addAll(List.of("net", "reference", "terminal", "case", "define", "require", "waive", "use", "purpose",
					"revision", "policy"));
			PartKind.VALUES.forEach(k -> words.add(k.getLiteral()));
		}
		return words;
	}

	private static boolean startsStatement(Token t) {
		return statementWords(false).contains(text(t)) || statementWords(true).contains(text(t));
	}

	/** "the settings of R1", "the actions of case "mains"", from the tokens before an opening '{'. */
	private static String blockOf(TokenStream tokens, Token open) {
		for (int i = open.getTokenIndex() - 1, seen = 0; i >= 0 && seen < 200; i--) {
			Token t = tokens.get(i);
			if (t.getChannel() != Token.DEFAULT_CHANNEL) {
				continue;
			}
			seen++;
			String text = text(t);
			Token next = nextVisible(tokens, i);
			String name = next == null ? "?" : text(next);
			if (text.equals("case")) {
				return "the actions of case " + name;
			}
			if (text.equals("define")) {
				Token defined = next == null ? null : nextVisible(tokens, next.getTokenIndex());
				return "the settings of definition " + (defined == null ? "?" : text(defined));
			}
			if (PartKind.get(text) != null && next != null && next.getType() == InternalBulwarkParser.RULE_ID) {
				Token defining = previousVisible(tokens, i);
				return (defining != null && text(defining).equals("define") ? "the settings of definition " : "the settings of ")
						+ name;
			}
		}
		return "the block";
	}

	/** The last opening token before {@code index} that no closing token matches. */
	private static Token unclosed(TokenStream tokens, int index, String opening, String closing) {
		List<Token> open = new ArrayList<>();
		for (int i = 0; i < index && i < tokens.size(); i++) {
			Token t = tokens.get(i);
			if (t.getChannel() != Token.DEFAULT_CHANNEL) {
				continue;
			}
			if (opening.equals(text(t))) {
				open.add(t);
			} else if (closing.equals(text(t)) && !open.isEmpty()) {
				open.remove(open.size() - 1);
			}
		}
		return open.isEmpty() ? null : open.get(open.size() - 1);
	}

	/** What the block a token stands in holds: a case's actions, or a part's settings. */
	private static String blockAdvice(TokenStream tokens, Token found) {
		Token open = unclosed(tokens, index(tokens, found), "{", "}");
		return open != null && blockOf(tokens, open).startsWith("the actions")
				? "a case's actions are apply, connect and short"
				: "a setting is a parameter (value 10 kΩ) or a rating (rated power 250 mW)";
	}

	/**
	 * A number followed by a word that is not a unit ("10k", "5 volts"): the parser then reads the word as the
	 * next setting's name and stumbles one token later, where it would only name the token it expected.
	 */
	private static SyntaxErrorMessage afterNumber(TokenStream tokens, Token found, Token word) {
		Token number = word == null ? null : previousVisible(tokens, index(tokens, word));
		if (word == null || number == null || word.getType() != InternalBulwarkParser.RULE_ID
				|| number.getType() != InternalBulwarkParser.RULE_NUMBER) {
			return null;
		}
		String text = text(word);
		String message = UnitParser.isBarePrefix(text)
				? "'" + text + "' after " + number.getText() + " is only a prefix: write the unit too, for example "
						+ number.getText() + " " + text + "Ω"
				: "'" + text + "' after " + number.getText() + " is not a unit Bulwark knows; units are Ω (or ohm),"
						+ " V, A, W, Ah, A²s, F, H, s, h, Hz, J, with the prefixes a f p n µ m k M G T";
		return new SyntaxErrorMessage(message, IssueCodes.UNKNOWN_UNIT);
	}

	/** A word of the language met where a name was wanted ("net led"). */
	private static boolean isWord(Token t) {
		String text = text(t);
		return text.matches("[A-Za-z_][A-Za-z_0-9]*") && t.getType() != InternalBulwarkParser.RULE_ID;
	}

	/** A token's text, "" for the end of the file and for tokens the parser invented while recovering. */
	private static String text(Token t) {
		return t == null || t.getText() == null ? "" : t.getText();
	}

	private static String at(Token t) {
		return t.getLine() + ":" + (t.getCharPositionInLine() + 1);
	}

	private static String nextText(TokenStream tokens, Token t) {
		Token next = nextVisible(tokens, t.getTokenIndex());
		return next == null ? "" : text(next);
	}

	/** Where a token stands in the stream; the end of the file, which has no index of its own, after the rest. */
	private static int index(TokenStream tokens, Token t) {
		return t.getTokenIndex() < 0 ? tokens.size() : t.getTokenIndex();
	}

	private static boolean hidden(Token t) {
		return t.getChannel() != Token.DEFAULT_CHANNEL || t.getType() == InternalBulwarkParser.RULE_WS
				|| t.getType() == InternalBulwarkParser.RULE_SL_COMMENT;
	}

	private static Token previousVisible(TokenStream tokens, int index) {
		for (int i = index - 1; i >= 0; i--) {
			Token t = tokens.get(i);
			if (!hidden(t)) {
				return t;
			}
		}
		return null;
	}

	private static Token nextVisible(TokenStream tokens, int index) {
		for (int i = index + 1; i < tokens.size(); i++) {
			Token t = tokens.get(i);
			if (!hidden(t)) {
				return t.getType() == Token.EOF ? null : t;
			}
		}
		return null;
	}

	private static Token firstVisible(TokenStream tokens) {
		return tokens.size() == 0 ? null : hidden(tokens.get(0)) ? nextVisible(tokens, 0) : tokens.get(0);
	}
}
