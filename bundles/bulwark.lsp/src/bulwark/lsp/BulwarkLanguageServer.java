package bulwark.lsp;

import java.io.InputStream;
import java.io.OutputStream;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Future;

import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.xtext.ide.server.LanguageServerImpl;
import org.eclipse.xtext.ide.server.ServerModule;
import org.eclipse.xtext.resource.IResourceServiceProvider;
import org.eclipse.xtext.resource.impl.ResourceServiceProviderRegistryImpl;
import org.eclipse.xtext.util.Modules2;

import com.google.inject.Guice;
import com.google.inject.Injector;
import com.google.inject.util.Modules;

import bulwark.check.DesignChecker;
import bulwark.check.load.DesignLoader;
import bulwark.lang.BulwarkRuntimeModule;
import bulwark.lang.BulwarkStandaloneSetup;
import bulwark.lang.ide.BulwarkIdeModule;

/**
 * The Bulwark language server: Xtext's LSP implementation over LSP4J, with the language, its IDE services and
 * the server module mixed in. It runs as plain Java on a flat class path; designs and review policies are
 * its documents.
 */
public final class BulwarkLanguageServer {
	private BulwarkLanguageServer() {
	}

	/** The server's injector, the language registered for both of its file extensions. */
	public static Injector injector() {
		// the plain runtime (which registers the EMF package) parses for the checker; the language's services
		// for the editor come from a second injector with the IDE and server modules mixed in
		Injector runtime = new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration();
		OpenDesigns designs = new OpenDesigns(new DesignChecker(new DesignLoader(runtime, bulwark.lang.install.Installation.fromLaunch())));
		Injector language = Guice.createInjector(
				Modules2.mixin(new BulwarkRuntimeModule(), new BulwarkIdeModule(), new BulwarkServerModule(designs)));
		IResourceServiceProvider provider = language.getInstance(IResourceServiceProvider.class);
		IResourceServiceProvider.Registry registry = new ResourceServiceProviderRegistryImpl();
		registry.getExtensionToFactoryMap().put("bulwark", provider);
		registry.getExtensionToFactoryMap().put("bulwark-policy", provider);
		// documents are made by this injector's factory, so that they carry its services (the checking validator)
		org.eclipse.xtext.resource.IResourceFactory factory = language
				.getInstance(org.eclipse.xtext.resource.IResourceFactory.class);
		Resource.Factory.Registry.INSTANCE.getExtensionToFactoryMap().put("bulwark", factory);
		Resource.Factory.Registry.INSTANCE.getExtensionToFactoryMap().put("bulwark-policy", factory);
		return Guice.createInjector(Modules.override(new ServerModule())
				.with(binder -> binder.bind(IResourceServiceProvider.Registry.class).toInstance(registry)));
	}

	/** Serves one client over the given streams until it disconnects. */
	public static Future<Void> start(InputStream in, OutputStream out) {
		LanguageServerImpl server = injector().getInstance(ProtocolServer.class);
		// every message checked before the protocol layer reads it: a malformed one is dropped, never the connection
		InputStream checked = new FramedInput(in,
				problem -> System.err.println("bulwark lsp: " + problem + "; reading on from the next Content-Length header"));
		Launcher<LanguageClient> launcher = LSPLauncher.createServerLauncher(server, checked, out);
		server.connect(launcher.getRemoteProxy());
		return launcher.startListening();
	}

	/** Runs on standard input and output until the client goes; exits cleanly when it does. */
	public static void main(String[] args) throws InterruptedException {
		try {
			start(System.in, System.out).get();
		} catch (ExecutionException e) {
			// the client closed the stream: nothing left to serve
		}
	}
}
