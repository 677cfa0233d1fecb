package bulwark.lang.scoping;

/**
 * Net references resolve by name within the design; Xtext's default local scoping already does that,
 * because the design itself has no name to qualify them with.
 */
public class BulwarkScopeProvider extends AbstractBulwarkScopeProvider {
}
