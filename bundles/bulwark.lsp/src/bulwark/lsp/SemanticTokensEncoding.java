package bulwark.lsp;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.SemanticTokenModifiers;
import org.eclipse.lsp4j.SemanticTokenTypes;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensLegend;
import org.eclipse.xtext.ide.server.Document;

import bulwark.lang.ide.highlight.SemanticRanges;

/**
 * The design's names as the protocol's semantic tokens, in the standard token types an editor already has
 * colours for: a net is a variable, a terminal a parameter, a part a class, a part definition a type; a
 * declaration carries the declaration modifier. Encoded relative to the previous token, as the protocol asks.
 */
final class SemanticTokensEncoding {
	static final List<String> TYPES = List.of(SemanticTokenTypes.Variable, SemanticTokenTypes.Parameter,
			SemanticTokenTypes.Class, SemanticTokenTypes.Type);
	static final List<String> MODIFIERS = List.of(SemanticTokenModifiers.Declaration);

	private SemanticTokensEncoding() {
	}

	static SemanticTokensLegend legend() {
		return new SemanticTokensLegend(TYPES, MODIFIERS);
	}

	static SemanticTokens encode(Document document, List<SemanticRanges.Range> ranges) {
		List<Integer> data = new ArrayList<>();
		int line = 0, character = 0;
		for (SemanticRanges.Range r : ranges) {
			Position p = document.getPosition(r.offset());
			data.add(p.getLine() - line);
			data.add(p.getLine() == line ? p.getCharacter() - character : p.getCharacter());
			data.add(r.length()); // names are single-line identifiers
			data.add(switch (r.kind()) {
			case NET -> 0;
			case TERMINAL -> 1;
			case PART -> 2;
			case DEFINITION -> 3;
			});
			data.add(r.declaration() ? 1 : 0);
			line = p.getLine();
			character = p.getCharacter();
		}
		return new SemanticTokens(data);
	}
}
