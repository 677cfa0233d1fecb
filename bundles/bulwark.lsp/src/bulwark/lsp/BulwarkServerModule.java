package bulwark.lsp;

import org.eclipse.xtext.ide.server.codeActions.ICodeActionService2;
import org.eclipse.xtext.ide.server.hover.IHoverService;
import org.eclipse.xtext.validation.IResourceValidator;

import com.google.inject.AbstractModule;

/** What the language server adds to the language's IDE services: the whole check, part hovers, quick fixes. */
public class BulwarkServerModule extends AbstractModule {
	private final OpenDesigns designs;

	/** @param designs the checker and results shared by validation, hover and code actions */
	public BulwarkServerModule(OpenDesigns designs) {
		this.designs = designs;
	}

	@SuppressWarnings("restriction") // the framework's code-action service is provisional API
	@Override
	protected void configure() {
		bind(OpenDesigns.class).toInstance(designs);
		bind(IResourceValidator.class).to(CheckingResourceValidator.class);
		bind(IHoverService.class).to(PartHoverService.class);
		bind(ICodeActionService2.class).to(QuickFixActions.class);
	}
}
