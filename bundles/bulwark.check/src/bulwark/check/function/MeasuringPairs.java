package bulwark.check.function;

import java.util.ArrayList;
import java.util.List;

import bulwark.check.compile.CompiledDesign;
import bulwark.lang.design.Member;
import bulwark.lang.design.Terminal;

/**
 * The terminal pairs an input is measured across: each terminal with the common one, or every pair when no
 * terminal is marked common; only terminals whose net some pin uses, only pairs on different nets.
 */
public final class MeasuringPairs {
	private MeasuringPairs() {
	}

	public static List<Terminal[]> of(CompiledDesign design) {
		List<Terminal> terminals = new ArrayList<>();
		for (Member m : design.design().getMembers()) {
			if (m instanceof Terminal t && t.getNet() != null && design.usedNets().contains(t.getNet().getName())) {
				terminals.add(t);
			}
		}
		Terminal common = terminals.stream().filter(Terminal::isCommon).findFirst().orElse(null);
		List<Terminal[]> pairs = new ArrayList<>();
		for (int i = 0; i < terminals.size(); i++) {
			for (int j = i + 1; j < terminals.size(); j++) {
				Terminal x = terminals.get(i), y = terminals.get(j);
				if (x.getNet() != y.getNet() && (common == null || x == common || y == common)) {
					pairs.add(new Terminal[] { x == common ? y : x, x == common ? x : y });
				}
			}
		}
		return pairs;
	}
}
