package bulwark.engine.solve;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;

/**
 * Finds the structural faults of a circuit before any arithmetic is done, so that the failure can name the
 * net or device responsible: a net without a DC path to the reference and a loop of ideal voltage sources,
 * which make the nodal equations singular, and a net held only by leakage, whose solution means nothing.
 */
final class TopologyCheck {
	private TopologyCheck() {
	}

	static Optional<SolveFailure> check(Circuit circuit) {
		int n = circuit.netCount();
		// Loops of ideal sources: union-find over nets joined by zero-resistance voltage devices.
		int[] parent = identity(n);
		for (Device d : circuit.devices()) {
			if (d.idealVoltage()) {
				int a = find(parent, d.pins()[0]);
				int b = find(parent, d.pins()[1]);
				if (a == b) {
					return Optional.of(new SolveFailure(SolveFailure.Reason.VOLTAGE_SOURCE_LOOP, d.name(),
							d.name() + " closes a loop of ideal voltage sources between nets "
									+ circuit.netName(d.pins()[0]) + " and " + circuit.netName(d.pins()[1])));
				}
				parent[a] = b;
			}
		}
		// DC paths: a device that conducts at DC ties all its nets (pins and internal ones) together.
		int[] group = identity(n);
		for (Device d : circuit.devices()) {
			if (d.conductsAtDc()) {
				int first = d.pins()[0];
				for (int p : d.pins()) {
					group[find(group, p)] = find(group, first);
				}
				for (int p : d.internalNets()) {
					group[find(group, p)] = find(group, first);
				}
			}
		}
		int root = find(group, Circuit.REFERENCE);
		List<String> floating = new ArrayList<>();
		for (int net = 1; net < n; net++) {
			if (find(group, net) != root) {
				floating.add(circuit.netName(net));
			}
		}
		if (!floating.isEmpty()) {
			return Optional.of(new SolveFailure(SolveFailure.Reason.FLOATING_NET, floating.get(0),
					"net " + String.join(", ", floating) + " has no DC path to the reference net "
							+ circuit.netName(Circuit.REFERENCE)));
		}
		return Optional.empty();
	}

	/**
	 * Nets held to the rest of the circuit only by leakage (a comparator input with nothing else on it): their
	 * voltage is set by picoamperes, and a comparator's gain turns that into an undefined output. Named
	 * before solving: Newton may converge there or break down at some pivot, and neither answer means
	 * anything; the failure points at the net that needs holding.
	 */
	static Optional<SolveFailure> heldOnlyByLeakage(Circuit circuit) {
		int n = circuit.netCount();
		int[] group = identity(n);
		for (Device d : circuit.devices()) {
			for (int[] joined : d.firmlyJoinedPins()) {
				for (int p : joined) {
					group[find(group, d.pins()[p])] = find(group, d.pins()[joined[0]]);
				}
				for (int p : d.internalNets()) {
					group[find(group, p)] = find(group, d.pins()[joined[0]]);
				}
			}
		}
		int root = find(group, Circuit.REFERENCE);
		List<String> weak = new ArrayList<>();
		for (int net = 1; net < n; net++) {
			if (find(group, net) != root) {
				weak.add(circuit.netName(net));
			}
		}
		if (weak.isEmpty()) {
			return Optional.empty();
		}
		List<String> holders = new ArrayList<>();
		List<String> atInputs = new ArrayList<>();
		for (Device d : circuit.devices()) {
			for (int pin : d.pins()) {
				String net = circuit.netName(pin);
				if (weak.contains(net) && isLeakOnly(d, pin)) {
					if (!holders.contains(d.name())) {
						holders.add(d.name());
					}
					if (!atInputs.contains(net)) {
						atInputs.add(net);
					}
				}
			}
		}
		// the nets at the inputs first: that is where the holding resistor goes
		weak.removeAll(atInputs);
		weak.addAll(0, atInputs);
		return Optional.of(new SolveFailure(SolveFailure.Reason.FLOATING_NET, weak.get(0), "net "
				+ String.join(", ", weak) + " is held only by the input leakage of " + String.join(", ", holders)
				+ ": its voltage, and so what those inputs decide, is undefined; hold it with a resistor to the "
				+ "reference or a rail"));
	}

	/** Whether the device touches the net only through a pin it holds by leakage. */
	private static boolean isLeakOnly(Device d, int net) {
		for (int i = 0; i < d.pins().length; i++) {
			if (d.pins()[i] == net) {
				for (int[] joined : d.firmlyJoinedPins()) {
					for (int p : joined) {
						if (p == i) {
							return false;
						}
					}
				}
				return true;
			}
		}
		return false;
	}

	private static int[] identity(int n) {
		int[] p = new int[n];
		for (int i = 0; i < n; i++) {
			p[i] = i;
		}
		return p;
	}

	private static int find(int[] parent, int i) {
		while (parent[i] != i) {
			parent[i] = parent[parent[i]];
			i = parent[i];
		}
		return i;
	}
}
