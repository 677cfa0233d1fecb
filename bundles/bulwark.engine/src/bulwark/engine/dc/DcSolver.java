package bulwark.engine.dc;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.CurrentSource;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.linear.DenseLuSolver;
import bulwark.engine.linear.LinearSolver;

/**
 * Linear DC operating point by modified nodal analysis: one unknown per net other than the reference and
 * one branch current per voltage source (Ho, Ruehli and Brennan, "The modified nodal approach to network
 * analysis", IEEE Trans. Circuits and Systems 22(6), 1975). A source's internal resistance enters its
 * branch equation, v+ − v− − R·i = E, so a battery needs no extra net.
 */
public final class DcSolver {

	public DcResult solve(Circuit circuit) {
		if (circuit.devices().isEmpty()) {
			return new SolveFailure(SolveFailure.Reason.EMPTY_CIRCUIT, null, "the circuit has no devices");
		}
		Optional<SolveFailure> structural = TopologyCheck.check(circuit);
		if (structural.isPresent()) {
			return structural.get();
		}
		int nodes = circuit.netCount() - 1;
		List<VoltageSource> sources = new ArrayList<>();
		for (Device d : circuit.devices()) {
			if (d instanceof VoltageSource v) {
				sources.add(v);
			}
		}
		int size = nodes + sources.size();
		double[][] a = new double[size][size];
		double[] rhs = new double[size];
		for (Device d : circuit.devices()) {
			if (d instanceof Resistor r) {
				stampConductance(a, r.pinA(), r.pinB(), 1.0 / r.ohms());
			} else if (d instanceof CurrentSource c) {
				// amps leave pin a's net into the source and re-enter the circuit at pin b's net.
				addTo(rhs, c.pinA(), -c.amps());
				addTo(rhs, c.pinB(), c.amps());
			}
		}
		for (int k = 0; k < sources.size(); k++) {
			VoltageSource v = sources.get(k);
			int row = nodes + k;
			if (v.pinA() != Circuit.REFERENCE) {
				a[v.pinA() - 1][row] += 1;
				a[row][v.pinA() - 1] += 1;
			}
			if (v.pinB() != Circuit.REFERENCE) {
				a[v.pinB() - 1][row] -= 1;
				a[row][v.pinB() - 1] -= 1;
			}
			a[row][row] = -v.seriesOhms();
			rhs[row] = v.volts();
		}
		LinearSolver lu = new DenseLuSolver();
		if (!lu.factor(a)) {
			int col = lu.singularColumn();
			String place = col < nodes ? circuit.netName(col + 1) : sources.get(col - nodes).name();
			return new SolveFailure(SolveFailure.Reason.SINGULAR_MATRIX, place,
					"the nodal equations are singular at " + (col < nodes ? "net " : "source ") + place);
		}
		double[] x = new double[size];
		lu.solve(rhs, x);
		double[] v = new double[circuit.netCount()];
		System.arraycopy(x, 0, v, 1, nodes);
		Map<String, OperatingPoint> points = new LinkedHashMap<>();
		int k = 0;
		for (Device d : circuit.devices()) {
			double across = v[d.pinA()] - v[d.pinB()];
			double current;
			if (d instanceof Resistor r) {
				current = across / r.ohms();
			} else if (d instanceof VoltageSource) {
				current = x[nodes + k++];
			} else {
				current = ((CurrentSource) d).amps();
			}
			points.put(d.name(), new OperatingPoint(d.name(), across, current, across * current));
		}
		return new DcSolution(circuit, v, points);
	}

	private static void stampConductance(double[][] a, int p, int q, double g) {
		if (p != Circuit.REFERENCE) {
			a[p - 1][p - 1] += g;
		}
		if (q != Circuit.REFERENCE) {
			a[q - 1][q - 1] += g;
		}
		if (p != Circuit.REFERENCE && q != Circuit.REFERENCE) {
			a[p - 1][q - 1] -= g;
			a[q - 1][p - 1] -= g;
		}
	}

	private static void addTo(double[] rhs, int net, double amps) {
		if (net != Circuit.REFERENCE) {
			rhs[net - 1] += amps;
		}
	}
}
