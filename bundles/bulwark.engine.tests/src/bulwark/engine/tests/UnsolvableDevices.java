package bulwark.engine.tests;

import bulwark.engine.circuit.Device;
import bulwark.engine.mna.SolutionView;
import bulwark.engine.mna.Stamp;

/**
 * Devices that make the nodal equations unsolvable in a known way, to hold the production solver to the
 * failure reason it must name. They are not models of parts.
 */
final class UnsolvableDevices {
	private UnsolvableDevices() {
	}

	/** Two pins, a to b, and a stamp: the part every device here shares. */
	private abstract static class TwoPins implements Device {
		private final String name;
		final int a;
		final int b;

		TwoPins(String name, int a, int b) {
			this.name = name;
			this.a = a;
			this.b = b;
		}

		@Override
		public String name() {
			return name;
		}

		@Override
		public int[] pins() {
			return new int[] { a, b };
		}

		@Override
		public String[] pinNames() {
			return new String[] { "a", "b" };
		}
	}

	/**
	 * A 1 Ω conductance from a net to the reference with a current source that pushes +1 A into the net while
	 * it is below 0.5 V and draws 1 A out of it otherwise, from {@code fromSeconds} on (a plain 1 Ω before).
	 * The net's voltage would have to be +1 V while below 0.5 V or −1 V while above it: the equations have
	 * no solution at all, so no iteration, gmin or source stepping may claim one.
	 */
	static Device noSolution(String name, int net, double fromSeconds) {
		return new TwoPins(name, net, 0) {
			@Override
			public boolean nonlinear() {
				return true;
			}

			@Override
			public void stamp(Stamp s) {
				s.conductance(a, b, 1);
				if (s.time() >= fromSeconds) {
					s.injectNet(a, s.voltage(a) < 0.5 ? 1 : -1);
				}
			}

			@Override
			public double[] pinCurrents(SolutionView x) {
				return new double[] { x.voltage(a), -x.voltage(a) };
			}
		};
	}

	/**
	 * A two-pin device that says it conducts at DC, so the topology check sees a path, but adds nothing to the
	 * equations: a net held only by it leaves an empty row and column, which only the factorisation can find.
	 */
	static Device claimsAPathButStampsNothing(String name, int a, int b) {
		return new TwoPins(name, a, b) {
			@Override
			public void stamp(Stamp s) {
			}

			@Override
			public double[] pinCurrents(SolutionView x) {
				return new double[] { 0, 0 };
			}
		};
	}
}
