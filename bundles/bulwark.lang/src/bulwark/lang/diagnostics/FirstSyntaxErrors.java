package bulwark.lang.diagnostics;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.nodemodel.INode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.validation.Issue;

/**
 * The issues worth reading of a text with syntax errors: the first error of each broken statement, and
 * nothing else. After a syntax error the parser recovers by guessing, and what follows in the same statement
 * (more syntax errors, a "missing" setting it skipped, a net that seems unused because the statement that
 * used it did not parse) repeats the first mistake in other words. An error is kept when the parser began a
 * new statement since the last one kept; the checks of meaning come back once the text parses.
 */
public final class FirstSyntaxErrors {
	private FirstSyntaxErrors() {
	}

	public static List<Issue> of(XtextResource resource, List<Issue> issues) {
		List<Issue> syntax = new ArrayList<>(issues.stream().filter(Issue::isSyntaxError).toList());
		if (syntax.isEmpty()) {
			return issues;
		}
		syntax.sort(Comparator.comparingInt(i -> offset(i)));
		List<Integer> starts = statementStarts(resource);
		List<Issue> kept = new ArrayList<>();
		for (Issue issue : syntax) {
			if (kept.isEmpty() || statementBetween(starts, offset(kept.get(kept.size() - 1)), offset(issue))) {
				kept.add(issue);
			}
		}
		return kept;
	}

	/** Where each statement the parser began starts (the members of the design, policy or library). */
	private static List<Integer> statementStarts(XtextResource resource) {
		List<Integer> starts = new ArrayList<>();
		if (resource.getContents().isEmpty()) {
			return starts;
		}
		for (EObject statement : resource.getContents().get(0).eContents()) {
			INode node = NodeModelUtils.getNode(statement);
			if (node != null) {
				starts.add(node.getOffset());
			}
		}
		return starts;
	}

	private static boolean statementBetween(List<Integer> starts, int after, int before) {
		return starts.stream().anyMatch(s -> s > after && s < before);
	}

	private static int offset(Issue i) {
		return i.getOffset() == null ? 0 : i.getOffset();
	}
}
