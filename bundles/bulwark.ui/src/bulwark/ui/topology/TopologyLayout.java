package bulwark.ui.topology;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.elk.alg.layered.options.LayerConstraint;
import org.eclipse.elk.alg.layered.options.LayeredMetaDataProvider;
import org.eclipse.elk.alg.layered.options.LayeredOptions;
import org.eclipse.elk.core.RecursiveGraphLayoutEngine;
import org.eclipse.elk.core.data.LayoutMetaDataService;
import org.eclipse.elk.core.options.CoreOptions;
import org.eclipse.elk.core.options.Direction;
import org.eclipse.elk.core.util.BasicProgressMonitor;
import org.eclipse.elk.graph.ElkBendPoint;
import org.eclipse.elk.graph.ElkEdge;
import org.eclipse.elk.graph.ElkEdgeSection;
import org.eclipse.elk.graph.ElkNode;
import org.eclipse.elk.graph.util.ElkGraphUtil;

import bulwark.lang.design.Design;
import bulwark.lang.design.Member;
import bulwark.lang.design.Net;
import bulwark.lang.design.Part;
import bulwark.lang.design.PinBinding;
import bulwark.lang.design.Terminal;

/**
 * The circuit laid out automatically by ELK's layered algorithm, left to right: terminals in the first
 * layer, each net a small junction, each part a box wired to the junctions of its pins.
 */
public final class TopologyLayout {
	/** A laid-out box: a part, a terminal or a net junction. */
	public record Box(String name, String kind, double x, double y, double width, double height) {
	}

	/** A wire as a polyline. */
	public record Wire(String part, String net, List<double[]> points) {
	}

	/** The whole drawing. */
	public record Drawing(List<Box> boxes, List<Wire> wires, double width, double height) {
	}

	private static volatile boolean registered;

	private TopologyLayout() {
	}

	public static Drawing of(Design design) {
		if (!registered) {
			LayoutMetaDataService.getInstance().registerLayoutMetaDataProviders(new LayeredMetaDataProvider());
			registered = true;
		}
		ElkNode root = ElkGraphUtil.createGraph();
		root.setProperty(CoreOptions.ALGORITHM, LayeredOptions.ALGORITHM_ID);
		root.setProperty(CoreOptions.DIRECTION, Direction.RIGHT);
		root.setProperty(LayeredOptions.SPACING_NODE_NODE, 24.0);
		Map<Net, ElkNode> nets = new HashMap<>();
		Map<ElkNode, String[]> names = new HashMap<>();
		List<ElkEdge> edges = new ArrayList<>();
		Map<ElkEdge, String[]> edgeNames = new HashMap<>();
		for (Member m : design.getMembers()) {
			if (m instanceof Net n) {
				ElkNode junction = node(root, 10, 10);
				nets.put(n, junction);
				names.put(junction, new String[] { n.getName(), "net" });
			}
		}
		for (Member m : design.getMembers()) {
			if (m instanceof Terminal t && nets.containsKey(t.getNet())) {
				ElkNode node = node(root, 70, 36);
				node.setProperty(LayeredOptions.LAYERING_LAYER_CONSTRAINT, LayerConstraint.FIRST);
				names.put(node, new String[] { t.getName(), "terminal" });
				ElkEdge e = ElkGraphUtil.createSimpleEdge(node, nets.get(t.getNet()));
				edges.add(e);
				edgeNames.put(e, new String[] { t.getName(), t.getNet().getName() });
			} else if (m instanceof Part p) {
				ElkNode node = node(root, 80, 36);
				names.put(node, new String[] { p.getName(), p.getKind().getLiteral() });
				for (PinBinding b : p.getPins()) {
					if (nets.containsKey(b.getNet())) {
						ElkEdge e = ElkGraphUtil.createSimpleEdge(nets.get(b.getNet()), node);
						edges.add(e);
						edgeNames.put(e, new String[] { p.getName(), b.getNet().getName() });
					}
				}
			}
		}
		new RecursiveGraphLayoutEngine().layout(root, new BasicProgressMonitor());
		List<Box> boxes = new ArrayList<>();
		names.forEach((node, n) -> boxes.add(new Box(n[0], n[1], node.getX(), node.getY(), node.getWidth(), node.getHeight())));
		List<Wire> wires = new ArrayList<>();
		for (ElkEdge e : edges) {
			for (ElkEdgeSection s : e.getSections()) {
				List<double[]> points = new ArrayList<>();
				points.add(new double[] { s.getStartX(), s.getStartY() });
				for (ElkBendPoint b : s.getBendPoints()) {
					points.add(new double[] { b.getX(), b.getY() });
				}
				points.add(new double[] { s.getEndX(), s.getEndY() });
				wires.add(new Wire(edgeNames.get(e)[0], edgeNames.get(e)[1], points));
			}
		}
		return new Drawing(boxes, wires, root.getWidth(), root.getHeight());
	}

	private static ElkNode node(ElkNode root, double width, double height) {
		ElkNode n = ElkGraphUtil.createNode(root);
		n.setDimensions(width, height);
		return n;
	}
}
