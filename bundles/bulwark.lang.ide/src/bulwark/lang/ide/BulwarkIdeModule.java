package bulwark.lang.ide;

/** Guice bindings of the UI-free IDE services (content assist now; quick fixes and the language server later). */
public class BulwarkIdeModule extends AbstractBulwarkIdeModule {
}
