package bulwark.engine.dc;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;

/**
 * Finds the two structural faults that make the nodal equations singular before any arithmetic is done,
 * so that the failure can name the net or device responsible: a net without a DC path to the reference,
 * and a loop of ideal voltage sources.
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
