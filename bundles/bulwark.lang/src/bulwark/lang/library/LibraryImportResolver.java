package bulwark.lang.library;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.scoping.impl.ImportUriResolver;

/**
 * Resolves {@code use "…"} through {@link LibraryPath}: an absolute file URI inside the allowed folders,
 * or nothing at all — a refused name is never loaded (the validator says why).
 */
public class LibraryImportResolver extends ImportUriResolver {
	@Override
	public String resolve(EObject object) {
		String written = super.resolve(object);
		if (written == null || object.eResource() == null) {
			return null;
		}
		return LibraryPath.locate(object.eResource(), written).file()
				.map(p -> URI.createFileURI(p.toString()).toString()).orElse(null);
	}
}
