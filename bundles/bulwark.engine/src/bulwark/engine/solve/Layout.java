package bulwark.engine.solve;

import java.util.List;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;
import bulwark.engine.linear.CscMatrix;
import bulwark.engine.linear.MinimumDegree;
import bulwark.engine.linear.PatternBuilder;

/**
 * Numbering of the unknowns — nets 1…N−1 take rows 0…N−2 (the reference net has none), then each device's
 * branch currents in device order — with the matrix pattern and its elimination order. Computed once per
 * circuit and shared by every Newton iteration and every fall-back step.
 */
final class Layout {
	final Circuit circuit;
	final Device[] devices;
	final int nodes;
	final int[] branchOffset;
	final int size;
	/** The places every stamp lands on, with zero values; each assembly works on a copy. */
	final CscMatrix pattern;
	/** Fill-reducing column order for the sparse LU. */
	final int[] order;
	/** Where each device's stamp calls land, replayed by every assembly. */
	final StampPlan plan;
	/** The pivots of the last successful factorisation, shared by every solve of this pattern. */
	final PivotMemory pivots;

	/** The same numbering, pattern and order for a circuit whose device at {@code index} was replaced. */
	private Layout(Layout base, Circuit circuit) {
		this.circuit = circuit;
		devices = circuit.devices().toArray(new Device[0]);
		nodes = base.nodes;
		branchOffset = base.branchOffset;
		size = base.size;
		pattern = base.pattern;
		order = base.order;
		plan = base.plan;
		pivots = base.pivots;
	}

	Layout withCircuit(Circuit replaced) {
		return new Layout(this, replaced);
	}

	Layout(Circuit circuit) {
		this.circuit = circuit;
		List<Device> list = circuit.devices();
		devices = list.toArray(new Device[0]);
		nodes = circuit.netCount() - 1;
		branchOffset = new int[devices.length];
		int row = nodes;
		for (int i = 0; i < devices.length; i++) {
			branchOffset[i] = row;
			row += devices[i].branchCount();
		}
		size = row;
		PatternBuilder builder = new PatternBuilder(size);
		plan = new StampPlan(devices.length);
		new PatternRecorder(this, builder, plan).record();
		pattern = builder.build();
		plan.resolve(pattern);
		order = MinimumDegree.order(pattern);
		pivots = new PivotMemory(size, order);
	}

	/** Row of a net, or −1 for the reference net. */
	static int row(int net) {
		return net - 1;
	}

	/** What an unknown is, for messages: "net X" or "branch of V1". */
	String describe(int unknown) {
		if (unknown < nodes) {
			return "net " + circuit.netName(unknown + 1);
		}
		for (int i = devices.length - 1; i >= 0; i--) {
			if (branchOffset[i] <= unknown && devices[i].branchCount() > 0) {
				return "device " + devices[i].name();
			}
		}
		return "unknown " + unknown;
	}

	/** The bare name of what an unknown belongs to: a net or a device. */
	String place(int unknown) {
		String d = describe(unknown);
		return d.substring(d.indexOf(' ') + 1);
	}
}
