package bulwark.engine.solve;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import bulwark.engine.circuit.Circuit;

/** A solved DC operating point: every net's voltage against the reference net, and every device's figures. */
public final class DcSolution implements DcResult {
	private final Circuit circuit;
	private final double[] netVoltages;
	/** Every device's operating point, in the circuit's order. */
	private final OperatingPoint[] points;
	private Map<String, OperatingPoint> byName;
	private final int iterations;
	private final Strategy strategy;
	/** Every unknown of the nodal equations, to start a neighbouring solve from (continuation). */
	final double[] unknowns;

	DcSolution(Circuit circuit, double[] netVoltages, OperatingPoint[] points, int iterations, Strategy strategy,
			double[] unknowns) {
		this.unknowns = unknowns.clone();
		this.circuit = circuit;
		this.netVoltages = netVoltages.clone();
		this.points = points;
		this.iterations = iterations;
		this.strategy = strategy;
	}

	/**
	 * A start for a solve of this circuit from another solution's net voltages (of a circuit with the same nets,
	 * for example this one with a device added): the branch currents stay this solution's.
	 */
	public DcSolution withNetVoltagesOf(DcSolution other) {
		double[] start = unknowns.clone();
		double[] nets = netVoltages.clone();
		for (int n = 1; n < nets.length && n < other.netVoltages.length; n++) {
			start[n - 1] = other.netVoltages[n];
			nets[n] = other.netVoltages[n];
		}
		return new DcSolution(circuit, nets, points, iterations, strategy, start);
	}

	public Circuit circuit() {
		return circuit;
	}

	public double voltage(String net) {
		return netVoltages[circuit.netIndex(net)];
	}

	public double voltage(int net) {
		return netVoltages[net];
	}

	/** Operating point of the named device; throws if there is none by that name. */
	public OperatingPoint device(String name) {
		int i = circuit.deviceIndex(name);
		if (i < 0) {
			throw new IllegalArgumentException("no device named " + name);
		}
		return points[i];
	}

	/** Operating point of the device at {@code index} in the circuit's order ({@link Circuit#deviceIndex}). */
	public OperatingPoint device(int index) {
		return points[index];
	}

	/** All devices in the order of the circuit, by name. */
	public Map<String, OperatingPoint> devices() {
		Map<String, OperatingPoint> map = byName;
		if (map == null) {
			map = new LinkedHashMap<>();
			for (OperatingPoint p : points) {
				map.put(p.device(), p);
			}
			byName = map = Collections.unmodifiableMap(map);
		}
		return map;
	}

	/** Newton iterations used in all, over every step of the strategy. */
	public int iterations() {
		return iterations;
	}

	public Strategy strategy() {
		return strategy;
	}
}
