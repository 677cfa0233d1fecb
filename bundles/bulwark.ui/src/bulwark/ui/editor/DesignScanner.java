package bulwark.ui.editor;

import java.util.List;

import org.eclipse.jface.text.TextAttribute;
import org.eclipse.jface.text.rules.EndOfLineRule;
import org.eclipse.jface.text.rules.IRule;
import org.eclipse.jface.text.rules.IToken;
import org.eclipse.jface.text.rules.IWordDetector;
import org.eclipse.jface.text.rules.NumberRule;
import org.eclipse.jface.text.rules.RuleBasedScanner;
import org.eclipse.jface.text.rules.SingleLineRule;
import org.eclipse.jface.text.rules.Token;
import org.eclipse.jface.text.rules.WhitespaceRule;
import org.eclipse.jface.text.rules.WordRule;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.widgets.Display;

import bulwark.lang.design.PartKind;

/**
 * Lexical highlighting of designs and policies in Bulwark's own colours: statement words in a deep teal,
 * part kinds bold, strings in olive, comments in grey italics, numbers in plum.
 */
class DesignScanner extends RuleBasedScanner {
	static final List<String> WORDS = List.of("design", "purpose", "revision", "policy", "use", "library", "define", "is",
			"reference", "net", "terminal", "at", "common", "rated", "case", "apply", "behind", "from", "to", "connect",
			"short", "waive", "on", "because", "by", "require", "between", "and", "mains", "none", "level", "surge",
			"derate", "minimum", "severity", "waivers", "need", "distribution");

	DesignScanner(Display display) {
		IToken word = token(display, 0, 95, 105, SWT.NONE);
		IToken kind = token(display, 0, 70, 110, SWT.BOLD);
		IToken string = token(display, 110, 110, 20, SWT.NONE);
		IToken comment = token(display, 120, 120, 120, SWT.ITALIC);
		IToken number = token(display, 120, 40, 110, SWT.NONE);
		WordRule words = new WordRule(new IWordDetector() {
			@Override
			public boolean isWordStart(char c) {
				return Character.isLetter(c) || c == '_';
			}

			@Override
			public boolean isWordPart(char c) {
				return Character.isLetterOrDigit(c) || c == '_';
			}
		}, Token.UNDEFINED);
		WORDS.forEach(w -> words.addWord(w, word));
		for (PartKind k : PartKind.values()) {
			words.addWord(k.getLiteral(), kind);
		}
		setRules(new IRule[] { new EndOfLineRule("#", comment), new SingleLineRule("\"", "\"", string, '\\'),
				new NumberRule(number), words, new WhitespaceRule(Character::isWhitespace) });
	}

	private static IToken token(Display display, int r, int g, int b, int style) {
		return new Token(new TextAttribute(new Color(display, r, g, b), null, style));
	}
}
