package bulwark.lang.validation;

import java.util.List;

import org.eclipse.emf.ecore.EPackage;
import org.eclipse.xtext.validation.AbstractDeclarativeValidator;
import org.eclipse.xtext.validation.Check;
import org.eclipse.xtext.validation.EValidatorRegistrar;

import bulwark.lang.design.Definition;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;
import bulwark.lang.design.Use;
import bulwark.lang.library.LibraryPath;

/** Library files that can be used, and parts made from definitions of their own kind. */
public class LibraryValidator extends AbstractDeclarativeValidator {
	/**
	 * Composed into BulwarkValidator (@ComposedChecks), which registers the checks: registering this one for
	 * the package too would run each of its checks twice and report every problem twice.
	 */
	@Override
	public void register(EValidatorRegistrar registrar) {
	}

	@Override
	protected List<EPackage> getEPackages() {
		return List.of(DesignPackage.eINSTANCE);
	}

	@Check
	public void useFindsItsFile(Use use) {
		if (use.eResource() == null) {
			return;
		}
		LibraryPath.Located l = LibraryPath.locate(use.eResource(), use.getImportURI());
		if (l.file().isEmpty()) {
			error(l.problem(), use, DesignPackage.Literals.USE__IMPORT_URI,
					l.problem().startsWith("no library") ? IssueCodes.LIBRARY_NOT_FOUND : IssueCodes.LIBRARY_OUTSIDE);
		}
	}

	@Check
	public void partOfItsDefinitionsKind(Part part) {
		Definition base = part.getBase();
		if (base != null && !base.eIsProxy() && base.getKind() != part.getKind()) {
			error(part.getName() + " is a " + part.getKind().getLiteral() + ", but " + base.getName() + " defines a "
					+ base.getKind().getLiteral(), part, DesignPackage.Literals.PART__BASE, IssueCodes.DEFINITION_KIND);
		}
	}
}
