package bulwark.lang;

import org.eclipse.xtext.parser.antlr.ISyntaxErrorMessageProvider;

import bulwark.lang.parser.SyntaxErrorMessages;

/** Guice bindings of the language runtime; the generated base binds everything the grammar needs. */
public class BulwarkRuntimeModule extends AbstractBulwarkRuntimeModule {

	public Class<? extends ISyntaxErrorMessageProvider> bindISyntaxErrorMessageProvider() {
		return SyntaxErrorMessages.class;
	}
}
