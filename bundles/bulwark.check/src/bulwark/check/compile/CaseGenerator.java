package bulwark.check.compile;

import java.util.ArrayList;
import java.util.List;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.lang.design.Action;
import bulwark.lang.design.Apply;
import bulwark.lang.design.Case;
import bulwark.lang.design.Connect;
import bulwark.lang.design.Member;
import bulwark.lang.design.Terminal;
import bulwark.lang.units.Quantities;

/**
 * The cases a design is checked under: the normal condition with its terminals open, then each case the
 * designer wrote, in order. (The abuse cases generated from the review policy join them later.)
 */
public final class CaseGenerator {
	private CaseGenerator() {
	}

	public static List<FaultCase> cases(CompiledDesign design) {
		List<FaultCase> cases = new ArrayList<>();
		cases.add(FaultCase.normalOpen());
		for (Member m : design.design().getMembers()) {
			if (m instanceof Case c) {
				cases.add(new FaultCase(c.getName(), "designer", devices(design.circuit(), c)));
			}
		}
		return cases;
	}

	/** The devices a case adds at the terminals; their names contain spaces, so no part can share them. */
	private static List<Device> devices(Circuit circuit, Case c) {
		List<Device> added = new ArrayList<>();
		int k = 0;
		for (Action action : c.getActions()) {
			String name = "case " + c.getName() + " #" + ++k;
			int from = circuit.netIndex(terminalNet(action.getFrom()));
			int to = circuit.netIndex(terminalNet(action.getTo()));
			if (action instanceof Apply a) {
				double ohms = a.getResistance() == null ? 0 : Quantities.si(a.getResistance()).orElseThrow();
				added.add(new VoltageSource(name, from, to, Quantities.si(a.getValue()).orElseThrow(), ohms));
			} else if (action instanceof Connect cn) {
				added.add(new Resistor(name, from, to, Quantities.si(cn.getValue()).orElseThrow()));
			} else {
				added.add(VoltageSource.ideal(name, from, to, 0)); // a wire: 0 V, any current
			}
		}
		return added;
	}

	private static String terminalNet(Terminal t) {
		return t.getNet().getName();
	}
}
