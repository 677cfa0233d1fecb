package bulwark.engine.properties;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.util.List;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.CurrentSource;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Random linear networks solved by the engine and, independently, by a dense solve of the nodal equations
 * written out here and handed to EJML (Abeles, Efficient Java Matrix Library). The two must agree to
 * 1e-9 relative [the issue's acceptance figure].
 */
class LinearNetworkProperties {
	private static final double RELATIVE = 1e-9;

	record Network(int nets, List<double[]> resistors, double sourceVolts, double sourceOhms, double injected) {
	}

	@Provide
	Arbitrary<Network> networks() {
		Arbitrary<Integer> nets = Arbitraries.integers().between(2, 40);
		return nets.flatMap(n -> {
			Arbitrary<double[]> resistor = Combinators.combine(Arbitraries.integers().between(0, n - 1),
					Arbitraries.integers().between(0, n - 1), Arbitraries.doubles().between(0, 9))
					.as((a, b, exponent) -> new double[] { a, b, Math.pow(10, exponent - 3) });
			return Combinators.combine(resistor.list().ofMinSize(n).ofMaxSize(4 * n),
					Arbitraries.doubles().between(-400, 400), Arbitraries.doubles().between(0, 100),
					Arbitraries.doubles().between(-1, 1))
					.as((rs, v, r, i) -> new Network(n, rs, v, r, i));
		});
	}

	/** Builds the circuit; a ladder of 1 kΩ keeps every net connected to the reference. */
	private static Circuit circuit(Network n) {
		Circuit.Builder b = Circuit.withReference("n0");
		for (int i = 1; i < n.nets(); i++) {
			b.net("n" + i);
		}
		for (int i = 1; i < n.nets(); i++) {
			b.add(new Resistor("RL" + i, i - 1, i, 1e3));
		}
		int k = 0;
		for (double[] r : n.resistors()) {
			if ((int) r[0] != (int) r[1]) {
				b.add(new Resistor("R" + k++, (int) r[0], (int) r[1], r[2]));
			}
		}
		b.add(new VoltageSource("V1", n.nets() - 1, 0, n.sourceVolts(), n.sourceOhms()));
		b.add(new CurrentSource("I1", 0, 1, n.injected()));
		return b.build();
	}

	/** The nodal equations written out directly: conductances, then the source's branch row. */
	private static double[] ejmlVoltages(Circuit c) {
		int nodes = c.netCount() - 1;
		int size = nodes + 1;
		DMatrixRMaj a = new DMatrixRMaj(size, size);
		DMatrixRMaj rhs = new DMatrixRMaj(size, 1);
		for (Device d : c.devices()) {
			int p = d.pins()[0] - 1, q = d.pins()[1] - 1;
			if (d instanceof Resistor r) {
				double g = 1 / r.ohms();
				if (p >= 0) a.add(p, p, g);
				if (q >= 0) a.add(q, q, g);
				if (p >= 0 && q >= 0) {
					a.add(p, q, -g);
					a.add(q, p, -g);
				}
			} else if (d instanceof VoltageSource v) {
				if (p >= 0) {
					a.add(p, nodes, 1);
					a.add(nodes, p, 1);
				}
				if (q >= 0) {
					a.add(q, nodes, -1);
					a.add(nodes, q, -1);
				}
				a.add(nodes, nodes, -v.seriesOhms());
				rhs.add(nodes, 0, v.volts());
			} else if (d instanceof CurrentSource s) {
				if (p >= 0) rhs.add(p, 0, -s.amps());
				if (q >= 0) rhs.add(q, 0, s.amps());
			}
		}
		DMatrixRMaj x = new DMatrixRMaj(size, 1);
		if (!CommonOps_DDRM.solve(a, rhs, x)) {
			throw new AssertionError("EJML found the system singular");
		}
		return x.data;
	}

	@Property(tries = 300, seed = "20261202")
	void engineAgreesWithEjml(@ForAll("networks") Network network) {
		Circuit c = circuit(network);
		DcSolution s = assertInstanceOf(DcSolution.class, new DcSolver().solve(c));
		double[] reference = ejmlVoltages(c);
		double scale = 0;
		for (int i = 0; i < c.netCount() - 1; i++) {
			scale = Math.max(scale, Math.abs(reference[i]));
		}
		for (int i = 1; i < c.netCount(); i++) {
			assertEquals(reference[i - 1], s.voltage(i), RELATIVE * scale + 1e-15, "net n" + i);
		}
	}
}
