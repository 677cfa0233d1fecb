package bulwark.lang.validation;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.Set;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.xtext.diagnostics.Severity;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.validation.CheckMode;
import org.eclipse.xtext.validation.Issue;
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
			String code = switch (l.refusal()) {
			case NOT_FOUND -> IssueCodes.LIBRARY_NOT_FOUND;
			case NOT_A_LIBRARY -> IssueCodes.LIBRARY_INVALID;
			case OUTSIDE -> IssueCodes.LIBRARY_OUTSIDE;
			};
			error(l.problem(), use, DesignPackage.Literals.USE__IMPORT_URI, code);
			return;
		}
		URI target = URI.createFileURI(l.file().get().toString());
		if (target.equals(ownFile(use)) || VALIDATING.get().contains(target)) {
			warning("'" + use.getImportURI() + "' is already being read: the libraries use each other in a circle; "
					+ "remove this use", use, DesignPackage.Literals.USE__IMPORT_URI, IssueCodes.LIBRARY_CYCLE);
			return;
		}
		for (Issue problem : libraryProblems(use, l.file().get())) {
			if (problem.getSeverity() == Severity.ERROR) {
				error(problem.getMessage(), use, DesignPackage.Literals.USE__IMPORT_URI, IssueCodes.LIBRARY_INVALID);
			} else {
				warning(problem.getMessage(), use, DesignPackage.Literals.USE__IMPORT_URI, IssueCodes.LIBRARY_CYCLE);
			}
		}
	}

	private static URI ownFile(Use use) {
		URI own = use.eResource().getURI();
		return own != null && own.isFile() ? URI.createFileURI(java.nio.file.Path.of(own.toFileString()).toAbsolutePath()
				.normalize().toString()) : null;
	}

	/** Libraries being validated on this thread: a library that uses itself, directly or not, is validated once. */
	private static final ThreadLocal<Set<URI>> VALIDATING = ThreadLocal.withInitial(HashSet::new);

	/**
	 * The errors of the library a design uses, each with its place in the library: a library is validated like
	 * the design itself (a power rating written in volts is refused there too), and a design whose library has
	 * errors is not checked, so that no part takes a rating the language would refuse.
	 */
	private static List<Issue> libraryProblems(Use use, java.nio.file.Path file) {
		URI uri = URI.createFileURI(file.toString());
		Set<URI> validating = VALIDATING.get();
		ResourceSet set = use.eResource().getResourceSet();
		if (set == null || !validating.add(uri)) {
			return List.of();
		}
		try {
			Resource library = set.getResource(uri, true);
			if (!(library instanceof XtextResource x)) {
				return List.of();
			}
			List<Issue> problems = new ArrayList<>();
			for (Issue issue : x.getResourceServiceProvider().getResourceValidator().validate(x, CheckMode.ALL,
					CancelIndicator.NullImpl)) {
				if (issue.getSeverity() == Severity.ERROR) {
					problems.add(problem(Severity.ERROR, "the library '" + use.getImportURI() + "' has an error at "
							+ issue.getLineNumber() + ":" + issue.getColumn() + ": " + issue.getMessage()
							+ " — fix the library; until then this design is not checked"));
				} else if (IssueCodes.LIBRARY_CYCLE.equals(issue.getCode())) {
					problems.add(problem(Severity.WARNING, "the library '" + use.getImportURI() + "' at "
							+ issue.getLineNumber() + ":" + issue.getColumn() + ": " + issue.getMessage()));
				}
			}
			return problems;
		} catch (RuntimeException e) {
			return List.of(problem(Severity.ERROR, "the library '" + use.getImportURI() + "' cannot be read: " + e.getMessage()));
		} finally {
			validating.remove(uri);
		}
	}

	private static Issue problem(Severity severity, String message) {
		Issue.IssueImpl issue = new Issue.IssueImpl();
		issue.setSeverity(severity);
		issue.setMessage(message);
		return issue;
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
