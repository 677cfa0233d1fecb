package bulwark.check.topology;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import bulwark.check.compile.CompiledDesign;
import bulwark.lang.design.Member;
import bulwark.lang.design.Net;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.lang.design.PinBinding;
import bulwark.lang.design.Terminal;

/**
 * Chains of resistors in series: resistors joined through nets that nothing else touches (exactly two pins,
 * both of resistors, no terminal, not the reference). Such a chain carries one current, so it shares its
 * voltage in proportion to its values — the usual way to spread a high voltage over parts rated lower.
 */
public final class SeriesStrings {
	/** One chain, its resistors in order from one end to the other, and the nets at its two ends. */
	public record SeriesString(List<Part> resistors, String endA, String endB) {
		public String label() {
			return String.join("–", resistors.stream().map(Part::getName).toList());
		}
	}

	private SeriesStrings() {
	}

	/** Every chain of two or more resistors. */
	public static List<SeriesString> of(CompiledDesign design) {
		// a 0 Ω link joins its two nets into one: resistors either side of it are in series
		Map<Net, Net> joined = new HashMap<>();
		for (Member m : design.design().getMembers()) {
			if (m instanceof Part link && link.getKind() == PartKind.LINK && link.getPins().size() == 2) {
				Net a = root(joined, link.getPins().get(0).getNet()), b = root(joined, link.getPins().get(1).getNet());
				if (a != b) {
					joined.put(a, b);
				}
			}
		}
		Map<Net, List<Part>> byNet = new HashMap<>();
		Map<Net, Integer> pinCount = new HashMap<>();
		Set<Net> atTerminal = new HashSet<>();
		Set<Net> reference = new HashSet<>();
		for (Member m : design.design().getMembers()) {
			if (m instanceof Part part && part.getKind() != PartKind.LINK) {
				for (PinBinding b : part.getPins()) {
					Net net = root(joined, b.getNet());
					pinCount.merge(net, 1, Integer::sum);
					if (part.getKind() == PartKind.RESISTOR) {
						byNet.computeIfAbsent(net, k -> new ArrayList<>()).add(part);
					}
				}
			} else if (m instanceof Terminal t) {
				atTerminal.add(root(joined, t.getNet()));
			} else if (m instanceof Net n && n.isReference()) {
				reference.add(root(joined, n));
			}
		}
		// a resistor's neighbours across inner nets
		Map<Part, List<Part>> next = new LinkedHashMap<>();
		for (Map.Entry<Net, List<Part>> e : byNet.entrySet()) {
			Net net = e.getKey();
			List<Part> rs = e.getValue();
			if (pinCount.get(net) == 2 && rs.size() == 2 && rs.get(0) != rs.get(1) && !atTerminal.contains(net)
					&& !reference.contains(net)) {
				next.computeIfAbsent(rs.get(0), k -> new ArrayList<>()).add(rs.get(1));
				next.computeIfAbsent(rs.get(1), k -> new ArrayList<>()).add(rs.get(0));
			}
		}
		List<SeriesString> strings = new ArrayList<>();
		Set<Part> seen = new HashSet<>();
		for (Part start : design.parts().values()) {
			// walk from an end: a resistor with at most one neighbour in the chain (a closed ring has none)
			if (!next.containsKey(start) || seen.contains(start) || next.get(start).size() != 1) {
				continue;
			}
			List<Part> chain = new ArrayList<>();
			Part previous = null, current = start;
			while (current != null && seen.add(current)) {
				chain.add(current);
				Part following = null;
				for (Part n : next.getOrDefault(current, List.of())) {
					if (n != previous && !seen.contains(n)) {
						following = n;
					}
				}
				previous = current;
				current = following;
			}
			strings.add(new SeriesString(chain, outerNet(joined, chain.get(0), chain.size() > 1 ? chain.get(1) : null),
					outerNet(joined, chain.get(chain.size() - 1), chain.size() > 1 ? chain.get(chain.size() - 2) : null)));
		}
		return strings;
	}

	/** The net a net is one with, through 0 Ω links. */
	private static Net root(Map<Net, Net> joined, Net net) {
		Net n = net;
		while (joined.containsKey(n)) {
			n = joined.get(n);
		}
		return n;
	}

	/** The net of {@code end} that it does not share with {@code inner} (nets joined by links being one). */
	private static String outerNet(Map<Net, Net> joined, Part end, Part inner) {
		Set<Net> shared = new HashSet<>();
		if (inner != null) {
			for (PinBinding b : inner.getPins()) {
				shared.add(root(joined, b.getNet()));
			}
		}
		for (PinBinding b : end.getPins()) {
			if (!shared.contains(root(joined, b.getNet()))) {
				return b.getNet().getName();
			}
		}
		return end.getPins().get(0).getNet().getName();
	}
}
