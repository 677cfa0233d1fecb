package bulwark.engine.properties;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.junit.jupiter.api.Test;

import bulwark.engine.circuit.Capacitor;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.PeriodicSteadyState;
import bulwark.engine.solve.PreparedCircuit;
import bulwark.engine.solve.TransientResult;
import bulwark.engine.solve.TransientSolver;
import bulwark.engine.device.DiodeModel;
import bulwark.engine.device.Physics;
import bulwark.engine.source.Sine;

/**
 * A half-wave rectifier under a 50 Hz sine — 1 kΩ and a silicon diode into 10 µF with 10 kΩ across it —
 * taken to its periodic steady state twice: by the engine (trapezoidal transient, then whole periods until
 * they repeat) and, independently, as the one ordinary differential equation it is,
 * C·dv/dt = i(vs − v) − v/RL, the diode-and-resistor current found by Brent's method at each evaluation,
 * integrated by Commons Math's Dormand–Prince 8(5,3) to 60 periods (RL·C = 0.1 s, so e^(−12) of the start
 * is left). The crest of the output and the load's average power must agree within 0.5 %.
 */
class RectifierSteadyStateCrossCheck {
	private static final double VP = 100, HZ = 50, PERIOD = 1 / HZ;
	private static final double R = 1e3, C = 10e-6, RL = 10e3;
	private static final double IS = DiodeModel.SILICON.saturationCurrent();
	private static final double VT = Physics.thermalVoltage(DiodeModel.SILICON.kelvin());

	@Test
	void theEngineAndAnOdeIntegratorReachTheSameSteadyState() {
		double[] engine = engine();
		double[] ode = ode();
		assertEquals(ode[0], engine[0], 0.005 * ode[0], "crest of the output");
		assertEquals(ode[1], engine[1], 0.005 * ode[1], "average power in the load");
		// sanity of the reference: the capacitor holds the output between the mean of the half-wave through the
		// divider, (Vp/π)·RL/(R + RL) = 28.9 V, and the divider's own crest less a diode drop, 90.3 V
		// [closed form, the two limits C → ∞ and C → 0]
		assertTrue(ode[0] > VP / Math.PI * RL / (R + RL) && ode[0] < (VP - 0.6) * RL / (R + RL), "crest " + ode[0]);
	}

	/** Crest of the output and average load power over the settled period, by the engine. */
	private static double[] engine() {
		Circuit.Builder b = Circuit.withReference("gnd");
		int in = b.net("in"), n = b.net("n"), out = b.net("out");
		b.add(new VoltageSource("V1", in, 0, new Sine(0, VP, HZ, 0), 0)).add(new Resistor("R1", in, n, R));
		b.diode("D1", n, out, DiodeModel.SILICON);
		b.add(new Capacitor("C1", out, 0, C)).add(new Resistor("RL", out, 0, RL));
		PreparedCircuit circuit = DcSolver.prepare(b.build());
		TransientSolver transients = new TransientSolver(new DcSolver());
		TransientResult first = transients.run(circuit, PERIOD, PERIOD / 100);
		assertTrue(first.completed(), () -> first.failure().message());
		PeriodicSteadyState.Result r = new PeriodicSteadyState(transients).run(circuit, first, PERIOD, PERIOD / 100,
				200);
		assertTrue(r.settled(), () -> r.failure().message());
		TransientResult p = r.period();
		double crest = p.peak(s -> s.voltage("out"));
		double energy = 0;
		for (int i = 1; i < p.points().size(); i++) {
			double v0 = p.points().get(i - 1).voltage("out"), v1 = p.points().get(i).voltage("out");
			energy += 0.5 * (v0 * v0 + v1 * v1) / RL * (p.times().get(i) - p.times().get(i - 1));
		}
		return new double[] { crest, energy / PERIOD };
	}

	/** The same by the ODE, over its last period. */
	private static double[] ode() {
		BrentSolver brent = new BrentSolver(1e-15, 1e-13);
		FirstOrderDifferentialEquations rectifier = new FirstOrderDifferentialEquations() {
			@Override
			public int getDimension() {
				return 1;
			}

			@Override
			public void computeDerivatives(double t, double[] y, double[] dy) {
				double across = VP * Math.sin(2 * Math.PI * HZ * t) - y[0]; // over the resistor and the diode
				// the diode's voltage vd where (across − vd)/R = Is·(e^(vd/VT) − 1)
				double vd = brent.solve(200, d -> (across - d) / R - IS * Math.expm1(d / VT),
						Math.min(across, 0) - 1, Math.max(across, 0) + 1);
				dy[0] = ((across - vd) / R - y[0] / RL) / C;
			}
		};
		int periods = 60;
		double[] crestAndEnergy = { Double.NEGATIVE_INFINITY, 0 };
		DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, PERIOD / 200, 1e-9, 1e-9);
		integrator.addStepHandler(new StepHandler() {
			@Override
			public void init(double t0, double[] y0, double t) {
			}

			@Override
			public void handleStep(StepInterpolator step, boolean isLast) {
				double from = step.getPreviousTime(), to = step.getCurrentTime();
				if (to <= (periods - 1) * PERIOD) {
					return;
				}
				// Simpson's rule on ten slices of each step of the last period, from the dense output
				int slices = 10;
				double a = Math.max(from, (periods - 1) * PERIOD), h = (to - a) / slices;
				for (int k = 0; k <= slices; k++) {
					step.setInterpolatedTime(a + k * h);
					double v = step.getInterpolatedState()[0];
					crestAndEnergy[0] = Math.max(crestAndEnergy[0], v);
					double weight = k == 0 || k == slices ? 1 : k % 2 == 1 ? 4 : 2;
					crestAndEnergy[1] += weight * h / 3 * v * v / RL;
				}
			}
		});
		integrator.integrate(rectifier, 0, new double[] { 0 }, periods * PERIOD, new double[1]);
		return new double[] { crestAndEnergy[0], crestAndEnergy[1] / PERIOD };
	}
}
