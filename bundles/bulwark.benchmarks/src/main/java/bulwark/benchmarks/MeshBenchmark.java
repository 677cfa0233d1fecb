package bulwark.benchmarks;

import java.util.concurrent.TimeUnit;

import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.ops.DConvertMatrixStruct;
import org.ejml.sparse.FillReducing;
import org.ejml.sparse.csc.factory.LinearSolverFactory_DSCC;
import org.ejml.interfaces.linsol.LinearSolverSparse;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.PreparedCircuit;

/**
 * Square resistor meshes of about 50, 500 and 5,000 nets: Bulwark's sparse solve (assembly, sparse LU in
 * minimum-degree order, triangular solves) against an EJML dense LU of the same nodal matrix, in one run.
 * The dense matrix is assembled in the set-up, so EJML is timed on factor and solve alone.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 2)
@Fork(value = 1, jvmArgs = { "-Xmx3g" })
public class MeshBenchmark {
	@Param({ "50", "500", "5000" })
	public int nets;

	private PreparedCircuit prepared;
	private final DcSolver solver = new DcSolver();
	private DMatrixRMaj dense;
	private DMatrixSparseCSC sparse;
	private DMatrixRMaj rhs;
	private DMatrixRMaj x;

	@Setup
	public void setUp() {
		Circuit c = Circuits.mesh(nets);
		prepared = DcSolver.prepare(c);
		int nodes = c.netCount() - 1;
		int size = nodes + 1;
		dense = new DMatrixRMaj(size, size);
		rhs = new DMatrixRMaj(size, 1);
		x = new DMatrixRMaj(size, 1);
		for (Device d : c.devices()) {
			int p = d.pins()[0] - 1, q = d.pins()[1] - 1;
			if (d instanceof Resistor r) {
				double g = 1 / r.ohms();
				if (p >= 0) dense.add(p, p, g);
				if (q >= 0) dense.add(q, q, g);
				if (p >= 0 && q >= 0) {
					dense.add(p, q, -g);
					dense.add(q, p, -g);
				}
			} else if (d instanceof VoltageSource v) {
				dense.add(p, nodes, 1);
				dense.add(nodes, p, 1);
				dense.add(nodes, nodes, -v.seriesOhms());
				rhs.set(nodes, 0, v.volts());
			}
		}
		sparse = DConvertMatrixStruct.convert(dense, (DMatrixSparseCSC) null, 0);
	}

	@Benchmark
	public DcResult bulwarkSparse() {
		return solver.solve(prepared);
	}

	/** EJML's sparse LU with its own fill-reducing ordering on the same matrix: the alternative to our own. */
	@Benchmark
	public DMatrixRMaj ejmlSparseLu() {
		LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> lu = LinearSolverFactory_DSCC.lu(FillReducing.NONE);
		if (!lu.setA(sparse.copy())) {
			throw new IllegalStateException("singular");
		}
		lu.solve(rhs, x);
		return x;
	}

	@Benchmark
	public DMatrixRMaj ejmlDenseLu() {
		LinearSolverDense<DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(dense.numRows);
		if (!lu.setA(dense.copy())) {
			throw new IllegalStateException("singular");
		}
		lu.solve(rhs, x);
		return x;
	}
}
