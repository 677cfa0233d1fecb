package bulwark.lang;

/** Guice bindings of the language runtime; the generated base binds everything the grammar needs. */
public class BulwarkRuntimeModule extends AbstractBulwarkRuntimeModule {
}
