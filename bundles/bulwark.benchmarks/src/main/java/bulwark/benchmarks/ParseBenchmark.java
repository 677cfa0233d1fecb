package bulwark.benchmarks;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.eclipse.emf.common.util.URI;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.validation.CheckMode;
import org.eclipse.xtext.validation.Issue;
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

import com.google.inject.Injector;

import bulwark.lang.BulwarkStandaloneSetup;

/** Parse, link and validate a 2,000-line design (goal: under 100 ms warm). */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ParseBenchmark {
	private Injector injector;
	private byte[] design;
	private int lines;

	@Setup
	public void setUp() {
		injector = new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration();
		StringBuilder text = new StringBuilder("design \"ladder of 340 sections\"\nreference net gnd\nnet n0\n");
		text.append("source V1 (plus: n0, minus: gnd) { voltage 12 V }\n");
		for (int i = 1; i <= 340; i++) { // six lines per section
			text.append("net n").append(i).append('\n');
			text.append("resistor RS").append(i).append(" (a: n").append(i - 1).append(", b: n").append(i)
					.append(") { value 1 kΩ ± 1 % rated power 250 mW }\n");
			text.append("resistor RP").append(i).append(" (a: n").append(i).append(", b: gnd) {\n");
			text.append("  value 10 kΩ ± 1 %\n  rated power 125 mW\n}\n");
		}
		design = text.toString().getBytes(StandardCharsets.UTF_8);
		lines = text.toString().split("\n").length;
		if (lines < 2000 || !parseAndValidate().isEmpty()) {
			throw new IllegalStateException("the benchmark design is not 2,000 clean lines: " + lines);
		}
	}

	@Benchmark
	public List<Issue> parseAndValidate() {
		XtextResourceSet set = injector.getInstance(XtextResourceSet.class);
		XtextResource resource = (XtextResource) set.createResource(URI.createURI("bench.bulwark"));
		try {
			resource.load(new ByteArrayInputStream(design), null);
		} catch (IOException e) {
			throw new IllegalStateException(e);
		}
		return resource.getResourceServiceProvider().getResourceValidator().validate(resource, CheckMode.ALL,
				CancelIndicator.NullImpl);
	}
}
