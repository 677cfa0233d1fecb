package bulwark.benchmarks;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
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
import bulwark.lang.BulwarkStandaloneSetup;

/**
 * The whole check of a 43-part design with five terminals under the built-in policy: parse, validate, the
 * open and four shorted cases, both mains systems as sines over their cycle across ten terminal pairs (a
 * quasi-static sweep: the design has no capacitor), every rule including the hysteresis sweeps of its four
 * comparators. Goal: under 60 ms warm with mains as waveforms (23.7 ms when mains was DC at the crest).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
// the JIT needs about 20 s of a whole check on two cores to finish compiling it: a shorter warm-up
// measured the compiler, not the check (3 × 2 s gave 137 ± 40 ms where 12 × 2 s gives the steady state)
@Warmup(iterations = 12, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FullCheckBenchmark {
	private DesignChecker checker;
	private String design;

	@Setup
	public void setUp() throws IOException {
		checker = new DesignChecker(new DesignLoader(new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration(),
				bulwark.lang.install.Installation.fromLaunch()));
		try (InputStream in = FullCheckBenchmark.class.getResourceAsStream("four-channel-input.bulwark")) {
			design = new String(in.readAllBytes(), StandardCharsets.UTF_8);
		}
		DesignResult r = fullCheck();
		if (r.status() == Status.ERROR || r.cases().size() < 45) {
			throw new IllegalStateException("the benchmark design was not fully checked: " + r.findings());
		}
	}

	@Benchmark
	public DesignResult fullCheck() {
		return checker.check(design, "four-channel-input.bulwark", CancelIndicator.NullImpl);
	}
}
