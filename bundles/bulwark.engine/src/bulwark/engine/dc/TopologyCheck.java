package bulwark.engine.dc;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.CurrentSource;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.VoltageSource;

/**
 * Finds the two structural faults that make the nodal equations singular before any arithmetic is done,
 * so that the failure can name the net or source responsible: a net without a DC path to the reference,
 * and a loop of ideal voltage sources.
 */
final class TopologyCheck {
	private TopologyCheck() {
	}

	static Optional<SolveFailure> check(Circuit circuit) {
		int n = circuit.netCount();
		// Loops of ideal sources: union-find over nets joined by zero-resistance sources.
		int[] parent = identity(n);
		for (Device d : circuit.devices()) {
			if (d instanceof VoltageSource v && v.seriesOhms() == 0) {
				int a = find(parent, v.pinA());
				int b = find(parent, v.pinB());
				if (a == b) {
					return Optional.of(new SolveFailure(SolveFailure.Reason.VOLTAGE_SOURCE_LOOP, v.name(),
							v.name() + " closes a loop of ideal voltage sources between nets "
									+ circuit.netName(v.pinA()) + " and " + circuit.netName(v.pinB())));
				}
				parent[a] = b;
			}
		}
		// DC paths: every device but a current source fixes a relation between its nets' voltages.
		int[] group = identity(n);
		for (Device d : circuit.devices()) {
			if (!(d instanceof CurrentSource)) {
				group[find(group, d.pinA())] = find(group, d.pinB());
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
