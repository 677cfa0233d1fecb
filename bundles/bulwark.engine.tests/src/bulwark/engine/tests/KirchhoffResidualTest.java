package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.util.Random;

import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.OperatingPoint;

/**
 * Independent check of random resistive ladders: whatever the solver did, Kirchhoff's current law must
 * hold at every net and Tellegen's theorem (absorbed powers sum to zero) for the whole circuit.
 */
class KirchhoffResidualTest {
	private static final long SEED = 20261202L;
	/**
	 * Residual current allowed at a net, relative to the backward-error scale of the solve, largest
	 * conductance × largest net voltage (Golub and Van Loan, §3.3: the computed solution solves a system
	 * perturbed by about machine epsilon × ‖A‖). A wrong stamp leaves residuals of the order of the currents.
	 */
	private static final double KCL_RELATIVE = 1e-12;

	@Test
	void randomLaddersSatisfyKclAndTellegen() {
		Random random = new Random(SEED);
		for (int trial = 0; trial < 50; trial++) {
			Circuit.Builder b = Circuit.withReference("gnd");
			int nets = 2 + random.nextInt(30);
			int[] ids = new int[nets];
			for (int i = 0; i < nets; i++) {
				ids[i] = b.net("n" + i);
			}
			b.add(new VoltageSource("V1", ids[0], 0, 1 + 300 * random.nextDouble(), random.nextDouble() * 50));
			for (int i = 1; i < nets; i++) {
				b.add(new Resistor("RS" + i, ids[i - 1], ids[i], Math.pow(10, 1 + 5 * random.nextDouble())));
				b.add(new Resistor("RP" + i, ids[i], random.nextBoolean() ? 0 : ids[random.nextInt(i)],
						Math.pow(10, 1 + 5 * random.nextDouble())));
			}
			Circuit c = b.build();
			DcSolution s = assertInstanceOf(DcSolution.class, new DcSolver().solve(c));
			double[] sum = new double[c.netCount()];
			double maxConductance = 1, maxVoltage = 0;
			for (int net = 0; net < c.netCount(); net++) {
				maxVoltage = Math.max(maxVoltage, Math.abs(s.voltage(net)));
			}
			double powerSum = 0;
			for (Device d : c.devices()) {
				OperatingPoint p = s.device(d.name());
				sum[d.pins()[0]] += p.current();
				sum[d.pins()[1]] -= p.current();
				if (d instanceof Resistor r) {
					maxConductance = Math.max(maxConductance, 1 / r.ohms());
				}
				powerSum += p.power();
			}
			for (int net = 0; net < c.netCount(); net++) {
				assertEquals(0, sum[net], maxConductance * maxVoltage * KCL_RELATIVE, "KCL at " + c.netName(net) + ", trial " + trial);
			}
			assertEquals(0, powerSum, maxConductance * maxVoltage * maxVoltage * KCL_RELATIVE, "Tellegen, trial " + trial);
		}
	}
}
