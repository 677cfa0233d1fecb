package bulwark.benchmarks;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

import org.eclipse.xtext.util.CancelIndicator;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.Status;
import bulwark.check.load.DesignLoader;
import bulwark.check.policy.DefaultPolicy;
import bulwark.check.policy.ReviewPolicy;
import bulwark.lang.BulwarkStandaloneSetup;
import bulwark.lang.install.Installation;

/**
 * The cost of one mains case by each method: a four-part design across one pair of terminals under 230 V
 * mains only, once resistive (the quasi-static sweep, 36 operating points) and once a capacitive dropper
 * (two switch-ons at the crest and the periods to the steady state). Each includes the design's open and
 * shorted cases and its rules, which a resistive-only run of the same size shows.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
// the JIT needs about 20 s of a whole check on two cores to finish compiling it: a shorter warm-up
// measured the compiler, not the check (3 × 2 s gave 137 ± 40 ms where 12 × 2 s gives the steady state)
@Warmup(iterations = 12, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class MainsCaseBenchmark {
	private static final String HEAD = """
			design "mains across one pair"
			reference net gnd
			net tip
			net mid
			terminal TIP at tip
			terminal COM at gnd common
			""";
	private static final String RESISTIVE = HEAD + """
			resistor R1 (a: tip, b: mid) { value 1 kΩ rated power 2 W rated voltage 500 V }
			resistor R2 (a: mid, b: gnd) { value 100 kΩ rated power 2 W rated voltage 500 V }
			diode D1 (anode: mid, cathode: gnd) { rated reverse 1000 V rated forward 1 A }
			""";
	private static final String DROPPER = HEAD + """
			resistor R1 (a: tip, b: mid) { value 1 kΩ rated power 2 W rated voltage 500 V }
			capacitor C1 (a: mid, b: gnd) { value 220 nF rated voltage 630 V }
			diode D1 (anode: mid, cathode: gnd) { rated reverse 1000 V rated forward 1 A }
			""";

	private DesignChecker checker;

	@Setup
	public void setUp() {
		ReviewPolicy mainsOnly = DefaultPolicy.POLICY.with("230 V mains only",
				new ReviewPolicy.Abuse(List.of(new ReviewPolicy.MainsSystem(230, 10)), List.of(), List.of())).notDerated();
		checker = new DesignChecker(new DesignLoader(new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration(),
				Installation.fromLaunch()), mainsOnly);
		for (DesignResult r : List.of(quasiStatic(), transientToSteadyState())) {
			if (r.status() == Status.ERROR) {
				throw new IllegalStateException("the benchmark design was not checked: " + r.findings());
			}
		}
	}

	@Benchmark
	public DesignResult quasiStatic() {
		return checker.check(RESISTIVE, "resistive.bulwark", CancelIndicator.NullImpl);
	}

	@Benchmark
	public DesignResult transientToSteadyState() {
		return checker.check(DROPPER, "dropper.bulwark", CancelIndicator.NullImpl);
	}
}
