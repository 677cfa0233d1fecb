package bulwark.check.finding;

import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.xtext.nodemodel.INode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;

/** Finds where a model element is written, so that findings point at the exact text. */
public final class Locations {
	private Locations() {
	}

	/** The location of the element's whole text. */
	public static SourceLocation of(EObject element) {
		return element == null ? SourceLocation.NONE : of(NodeModelUtils.findActualNodeFor(element));
	}

	/** The location of one feature's text, for example a part's designator; the whole element if absent. */
	public static SourceLocation of(EObject element, EStructuralFeature feature) {
		List<INode> nodes = NodeModelUtils.findNodesForFeature(element, feature);
		return nodes.isEmpty() ? of(element) : of(nodes.get(0));
	}

	private static SourceLocation of(INode node) {
		if (node == null) {
			return SourceLocation.NONE;
		}
		var lc = NodeModelUtils.getLineAndColumn(node, node.getOffset());
		return new SourceLocation(lc.getLine(), lc.getColumn(), node.getOffset(), node.getLength());
	}
}
