package bulwark.benchmarks;

import java.util.concurrent.TimeUnit;

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

import bulwark.engine.circuit.Circuit;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.PreparedCircuit;

/** Operating point of a 40-part probe-style circuit with 325 V on its tip (goal: under 50 µs warm). */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class OperatingPointBenchmark {
	private Circuit circuit;
	private PreparedCircuit prepared;
	private final DcSolver solver = new DcSolver();

	@Setup
	public void setUp() {
		circuit = Circuits.probe();
		prepared = DcSolver.prepare(circuit);
		DcResult r = solver.solve(prepared);
		if (!(r instanceof DcSolution)) {
			throw new IllegalStateException("the benchmark circuit does not solve: " + r);
		}
	}

	/** Symbolic work reused: what every case and sweep point of a check costs. */
	@Benchmark
	public DcResult probePrepared() {
		return solver.solve(prepared);
	}

	/** Including the numbering, pattern and ordering of the circuit. */
	@Benchmark
	public DcResult probeFromScratch() {
		return solver.solve(circuit);
	}
}
