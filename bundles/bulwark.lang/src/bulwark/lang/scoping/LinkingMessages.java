package bulwark.lang.scoping;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.xtext.diagnostics.DiagnosticMessage;
import org.eclipse.xtext.diagnostics.Severity;
import org.eclipse.xtext.linking.impl.LinkingDiagnosticMessageProvider;
import org.eclipse.xtext.resource.IEObjectDescription;
import org.eclipse.xtext.scoping.IScopeProvider;

import com.google.inject.Inject;

import bulwark.lang.design.DesignPackage;
import bulwark.lang.naming.Suggestion;
import bulwark.lang.validation.IssueCodes;

/**
 * A name that refers to nothing, in the design's terms: "no net 'X' in this design (did you mean 'x1'?)".
 * The suggestion is the closest name of the same sort in scope.
 */
public class LinkingMessages extends LinkingDiagnosticMessageProvider {
	@Inject
	private IScopeProvider scopes;

	@Override
	public DiagnosticMessage getUnresolvedProxyMessage(ILinkingDiagnosticContext context) {
		EClass type = context.getReference().getEReferenceType();
		String name = context.getLinkText();
		List<String> known = new ArrayList<>();
		try {
			for (IEObjectDescription d : scopes.getScope(context.getContext(), context.getReference()).getAllElements()) {
				known.add(d.getName().toString());
			}
		} catch (RuntimeException e) {
			// a scope that cannot be listed (a broken library) only loses the suggestion
		}
		String message = "no " + sort(type) + " '" + name + "' " + where(type) + Suggestion.didYouMean(name, known);
		return new DiagnosticMessage(message, Severity.ERROR, IssueCodes.UNKNOWN_NAME);
	}

	private static String sort(EClass type) {
		DesignPackage p = DesignPackage.eINSTANCE;
		if (type == p.getNet()) {
			return "net";
		}
		if (type == p.getTerminal()) {
			return "terminal";
		}
		if (type == p.getPart()) {
			return "part";
		}
		if (type == p.getDefinition()) {
			return "definition";
		}
		return type.getName().toLowerCase(java.util.Locale.ROOT);
	}

	private static String where(EClass type) {
		return type == DesignPackage.eINSTANCE.getDefinition()
				? "in this design or the libraries it uses"
				: "in this design";
	}
}
