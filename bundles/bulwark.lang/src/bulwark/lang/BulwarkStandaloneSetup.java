package bulwark.lang;

/** Sets the language up without the Equinox extension registry: command line, tests, language server. */
public class BulwarkStandaloneSetup extends BulwarkStandaloneSetupGenerated {

	public static void doSetup() {
		new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration();
	}
}
