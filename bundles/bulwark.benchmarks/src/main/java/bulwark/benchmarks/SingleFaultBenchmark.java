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
 * The whole check of the 43-part design of {@link FullCheckBenchmark} with the single-fault analysis: every
 * part failed in each of its ways (short, open; a transistor's pin pairs) and every case solved again with it.
 * Goal: under 1 s on two cores.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 4, time = 5)
@Measurement(iterations = 5, time = 5)
@Fork(1)
public class SingleFaultBenchmark {
	private DesignChecker checker;
	private String design;

	@Setup
	public void setUp() throws IOException {
		checker = new DesignChecker(new DesignLoader(new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration(),
				bulwark.lang.install.Installation.fromLaunch())).withSingleFaults();
		try (InputStream in = SingleFaultBenchmark.class.getResourceAsStream("four-channel-input.bulwark")) {
			design = new String(in.readAllBytes(), StandardCharsets.UTF_8);
		}
		DesignResult r = withSingleFaults();
		if (r.status() == Status.ERROR) {
			throw new IllegalStateException("the benchmark design was not checked: " + r.findings());
		}
	}

	@Benchmark
	public DesignResult withSingleFaults() {
		return checker.check(design, "four-channel-input.bulwark", CancelIndicator.NullImpl);
	}
}
