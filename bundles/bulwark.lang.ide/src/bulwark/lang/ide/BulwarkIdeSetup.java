package bulwark.lang.ide;

import com.google.inject.Guice;
import com.google.inject.Injector;

import org.eclipse.xtext.util.Modules2;

import bulwark.lang.BulwarkRuntimeModule;
import bulwark.lang.BulwarkStandaloneSetup;

/** The language with its IDE services mixed in, for the workbench and the language server. */
public class BulwarkIdeSetup extends BulwarkStandaloneSetup {

	@Override
	public Injector createInjector() {
		return Guice.createInjector(Modules2.mixin(new BulwarkRuntimeModule(), new BulwarkIdeModule()));
	}
}
