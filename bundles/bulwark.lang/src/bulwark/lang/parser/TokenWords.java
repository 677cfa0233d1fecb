package bulwark.lang.parser;

import org.antlr.runtime.Token;

import bulwark.lang.parser.antlr.internal.InternalBulwarkParser;

/** What the language's tokens are called in messages: "a name", "a number", "'{'", "the end of the file". */
final class TokenWords {
	private TokenWords() {
	}

	/** The kind of token the parser wanted, by its type. */
	static String expected(int type) {
		switch (type) {
		case Token.EOF:
			return "the end of the file";
		case InternalBulwarkParser.RULE_ID:
			return "a name";
		case InternalBulwarkParser.RULE_NUMBER:
			return "a number";
		case InternalBulwarkParser.RULE_STRING:
			return "a text in double quotes";
		case InternalBulwarkParser.RULE_UNIT:
			return "a unit";
		default:
			if (type > 0 && type < InternalBulwarkParser.tokenNames.length) {
				String name = InternalBulwarkParser.tokenNames[type];
				return name.startsWith("'") ? name.replace("\\u00B1", "±") : name;
			}
			return "something else";
		}
	}

	/** A token as it stands in the text: "'1a'", or "the end of the file". */
	static String found(Token token) {
		if (token == null || token.getType() == Token.EOF) {
			return "the end of the file";
		}
		return token.getText() == null ? "the text here" : "'" + token.getText() + "'";
	}

	static boolean isEnd(Token token) {
		return token == null || token.getType() == Token.EOF;
	}
}
