package bulwark.lang.parser;

import org.antlr.runtime.RecognitionException;
import org.antlr.runtime.Token;
import org.antlr.runtime.TokenStream;
import org.eclipse.xtext.nodemodel.SyntaxErrorMessage;
import org.eclipse.xtext.parser.antlr.SyntaxErrorMessageProvider;

import bulwark.lang.parser.antlr.internal.InternalBulwarkParser;
import bulwark.lang.units.UnitParser;
import bulwark.lang.validation.IssueCodes;

/**
 * Says what went wrong when a number is followed by a word that is not a unit ("10k", "5 volts"): the
 * parser then reads the word as the next setting's name and stumbles one token later, where its own
 * message would only name the token it expected. Also when a name is one of the language's words
 * ("net led"), where the parser's own message would speak of RULE_ID.
 */
public class SyntaxErrorMessages extends SyntaxErrorMessageProvider {

	@Override
	public SyntaxErrorMessage getSyntaxErrorMessage(IParserErrorContext context) {
		RecognitionException e = context.getRecognitionException();
		if (e != null && e.token != null && e.input instanceof TokenStream) {
			TokenStream tokens = (TokenStream) e.input;
			Token word = previousVisible(tokens, e.token.getTokenIndex());
			Token number = word == null ? null : previousVisible(tokens, word.getTokenIndex());
			if (word != null && number != null && word.getType() == InternalBulwarkParser.RULE_ID
					&& number.getType() == InternalBulwarkParser.RULE_NUMBER) {
				String text = word.getText();
				String message = UnitParser.isBarePrefix(text)
						? "'" + text + "' after " + number.getText() + " is only a prefix: write the unit too, for example "
								+ number.getText() + " " + text + "Ω"
						: "'" + text + "' after " + number.getText() + " is not a unit Bulwark knows; units are Ω (or ohm),"
								+ " V, A, W, Ah, F, H, s, h, Hz, J, with the prefixes p n µ m k M G T";
				return new SyntaxErrorMessage(message, IssueCodes.UNKNOWN_UNIT);
			}
			// a name that is a keyword ("net led", "net level"): say so, and how to write it
			String text = e.token.getText();
			String expected = context.getDefaultMessage();
			if (text != null && text.matches("[A-Za-z_][A-Za-z_0-9]*") && e.token.getType() != InternalBulwarkParser.RULE_ID
					&& expected != null && expected.contains("RULE_ID")) {
				return new SyntaxErrorMessage("'" + text + "' is a word of the language and cannot be a name as it is;"
						+ " write ^" + text + " to use it as one", IssueCodes.KEYWORD_AS_NAME);
			}
		}
		return super.getSyntaxErrorMessage(context);
	}

	private static Token previousVisible(TokenStream tokens, int index) {
		for (int i = index - 1; i >= 0; i--) {
			Token t = tokens.get(i);
			boolean hidden = t.getChannel() != Token.DEFAULT_CHANNEL || t.getType() == InternalBulwarkParser.RULE_WS
					|| t.getType() == InternalBulwarkParser.RULE_SL_COMMENT;
			if (!hidden) {
				return t;
			}
		}
		return null;
	}
}
