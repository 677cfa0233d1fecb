package bulwark.lang;

import org.eclipse.xtext.parser.antlr.ISyntaxErrorMessageProvider;
import org.eclipse.xtext.scoping.IGlobalScopeProvider;
import org.eclipse.xtext.scoping.impl.ImportUriGlobalScopeProvider;
import org.eclipse.xtext.scoping.impl.ImportUriResolver;

import bulwark.lang.library.LibraryImportResolver;
import bulwark.lang.parser.SyntaxErrorMessages;

/** Guice bindings of the language runtime; the generated base binds everything the grammar needs. */
public class BulwarkRuntimeModule extends AbstractBulwarkRuntimeModule {

	/** Names may be unit symbols (see the grammar's Name rule). */
	@Override
	public Class<? extends org.eclipse.xtext.conversion.IValueConverterService> bindIValueConverterService() {
		return bulwark.lang.conversion.BulwarkValueConverters.class;
	}

	public Class<? extends ISyntaxErrorMessageProvider> bindISyntaxErrorMessageProvider() {
		return SyntaxErrorMessages.class;
	}

	public Class<? extends org.eclipse.xtext.linking.ILinkingDiagnosticMessageProvider> bindILinkingDiagnosticMessageProvider() {
		return bulwark.lang.scoping.LinkingMessages.class;
	}

	/** A design sees what its own file declares and the definitions of the libraries it uses, nothing else. */
	@Override
	public Class<? extends IGlobalScopeProvider> bindIGlobalScopeProvider() {
		return ImportUriGlobalScopeProvider.class;
	}

	/** {@code use "…"} resolves inside the design's folder and the library path only. */
	public Class<? extends ImportUriResolver> bindImportUriResolver() {
		return LibraryImportResolver.class;
	}
}
