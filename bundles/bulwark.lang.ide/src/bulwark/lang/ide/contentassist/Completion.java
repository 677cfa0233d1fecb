package bulwark.lang.ide.contentassist;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

import org.eclipse.xtext.ide.editor.contentassist.ContentAssistContext;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistEntry;
import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalAcceptor;
import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalProvider;
import org.eclipse.xtext.ide.editor.contentassist.antlr.ContentAssistContextFactory;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.TextRegion;

import com.google.inject.Injector;

import bulwark.lang.ide.InMemoryResource;

/**
 * Completion for an editor without Xtext's UI (the workbench's JFace editor): the language's IDE services
 * asked directly for the proposals at an offset — keywords, names in scope, and the kind catalogue's pins,
 * settings and units (BulwarkProposalProvider).
 */
public final class Completion {
	private static final ExecutorService POOL = Executors.newCachedThreadPool(r -> {
		Thread t = new Thread(r, "bulwark completion");
		t.setDaemon(true);
		return t;
	});

	private Completion() {
	}

	/** The proposals at an offset of a text, in the order the provider ranks them. */
	public static List<ContentAssistEntry> at(Injector injector, String text, String file, int offset) {
		XtextResource resource = InMemoryResource.load(injector, text, file);
		ContentAssistContextFactory factory = injector.getInstance(ContentAssistContextFactory.class);
		factory.setPool(POOL);
		ContentAssistContext[] contexts = factory.create(text, new TextRegion(offset, 0), offset, resource);
		IdeContentProposalAcceptor acceptor = injector.getInstance(IdeContentProposalAcceptor.class);
		injector.getInstance(IdeContentProposalProvider.class).createProposals(Arrays.asList(contexts), acceptor);
		List<ContentAssistEntry> entries = new ArrayList<>();
		acceptor.getEntries().forEach(entries::add);
		return entries;
	}
}
