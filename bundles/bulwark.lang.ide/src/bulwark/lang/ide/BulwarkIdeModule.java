package bulwark.lang.ide;

import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalProvider;

import bulwark.lang.ide.contentassist.BulwarkProposalProvider;

/** Guice bindings of the UI-free IDE services: completion from the kind catalogue. */
public class BulwarkIdeModule extends AbstractBulwarkIdeModule {
	public Class<? extends IdeContentProposalProvider> bindIdeContentProposalProvider() {
		return BulwarkProposalProvider.class;
	}
}
