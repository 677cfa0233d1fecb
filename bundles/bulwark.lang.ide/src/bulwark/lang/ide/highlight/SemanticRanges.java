package bulwark.lang.ide.highlight;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.Assignment;
import org.eclipse.xtext.CrossReference;
import org.eclipse.xtext.RuleCall;
import org.eclipse.xtext.nodemodel.ILeafNode;
import org.eclipse.xtext.nodemodel.INode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.eclipse.xtext.resource.XtextResource;

import com.google.inject.Injector;

import bulwark.lang.design.DesignPackage;
import bulwark.lang.ide.InMemoryResource;

/**
 * What each name in a design stands for — a net, a terminal, a part or a part definition, declared or
 * referred to — read from the parse (the grammar's cross-references and name assignments), for highlighting
 * that tells a net from a part where the lexer cannot. A text that does not parse still yields the names of
 * the parts that do.
 */
public final class SemanticRanges {
	public enum Kind {
		NET, TERMINAL, PART, DEFINITION
	}

	/** One name: where it is, what it stands for, and whether this is its declaration. */
	public record Range(int offset, int length, Kind kind, boolean declaration) {
	}

	private SemanticRanges() {
	}

	public static List<Range> of(Injector injector, String text, String file) {
		XtextResource resource = InMemoryResource.load(injector, text, file);
		return of(resource);
	}

	/** The names of a parsed resource, in text order. */
	public static List<Range> of(XtextResource resource) {
		if (resource.getParseResult() == null || resource.getParseResult().getRootNode() == null) {
			return List.of();
		}
		return of(resource.getParseResult().getRootNode());
	}

	static List<Range> of(INode root) {
		List<Range> ranges = new ArrayList<>();
		for (ILeafNode leaf : root.getLeafNodes()) {
			if (leaf.isHidden()) {
				continue;
			}
			// a reference's token carries the cross-reference itself (or, in some parses, the rule call inside it)
			EObject element = leaf.getGrammarElement();
			// a name's token stands inside the Name rule (a word or a unit symbol): what names it is the call of that rule
			EObject outer = leaf.getParent() == null ? null : leaf.getParent().getGrammarElement();
			if (element instanceof RuleCall inner && inner.eContainer() != null
					&& org.eclipse.xtext.GrammarUtil.containingRule(inner) != null
					&& "Name".equals(org.eclipse.xtext.GrammarUtil.containingRule(inner).getName())
					&& (outer instanceof RuleCall || outer instanceof CrossReference)) {
				element = outer;
			}
			CrossReference ref = element instanceof CrossReference r ? r
					: element instanceof RuleCall c && c.eContainer() instanceof CrossReference r ? r : null;
			if (ref != null && ref.getType().getClassifier() instanceof EClass type) {
				Kind kind = kindOf(type);
				if (kind != null) {
					ranges.add(new Range(leaf.getOffset(), leaf.getLength(), kind, false));
				}
			} else if (element instanceof RuleCall call && call.eContainer() instanceof Assignment a && "name".equals(a.getFeature())) {
				EObject owner = NodeModelUtils.findActualSemanticObjectFor(leaf);
				Kind kind = owner == null ? null : kindOf(owner.eClass());
				if (kind != null) {
					ranges.add(new Range(leaf.getOffset(), leaf.getLength(), kind, true));
				}
			}
		}
		return ranges;
	}

	private static Kind kindOf(EClass type) {
		DesignPackage p = DesignPackage.eINSTANCE;
		if (p.getNet().isSuperTypeOf(type)) {
			return Kind.NET;
		}
		if (p.getTerminal().isSuperTypeOf(type)) {
			return Kind.TERMINAL;
		}
		if (p.getPart().isSuperTypeOf(type)) {
			return Kind.PART;
		}
		if (p.getDefinition().isSuperTypeOf(type)) {
			return Kind.DEFINITION;
		}
		return null;
	}
}
