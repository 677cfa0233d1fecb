package bulwark.check.compile;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;

import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.engine.dc.DcSolution;
import bulwark.engine.dc.DcSolver;
import bulwark.engine.dc.PreparedCircuit;
import bulwark.engine.dc.TransientResult;
import bulwark.engine.dc.TransientSolver;
import bulwark.lang.design.Part;

/**
 * Solves a surge case as a transient and keeps the instants that matter: for every part and every stress,
 * the accepted time point where that stress peaks. Each becomes an outcome of its own ("…, at 1.6 µs"), so
 * the rules see every peak exactly as solved. Power is not among them: a part's power rating is for
 * continuous dissipation, and a 50 µs pulse is judged against pulse ratings the design does not carry.
 */
final class SurgeRunner {
	/** Long enough for the 1.2/50 µs wave to fall well below half its peak [IEC 61000-4-5; closed form]. */
	static final double STOP = 150e-6;
	/** Largest step; the error control shortens it on the front. */
	static final double MAX_STEP = 2e-6;

	private SurgeRunner() {
	}

	static List<CaseOutcome> run(CompiledDesign design, FaultCase c, PreparedCircuit circuit, DcSolver solver) {
		TransientResult t = new TransientSolver(solver).run(circuit, STOP, MAX_STEP);
		if (!t.completed()) {
			return List.of(new CaseOutcome(c, t.failure()));
		}
		TreeSet<Integer> instants = new TreeSet<>();
		for (Part part : design.parts().values()) {
			for (Measure m : StressCatalog.of(part.getKind())) {
				if (!m.appliesIn(c, part.getName())) {
					continue;
				}
				int best = 0;
				for (int i = 1; i < t.points().size(); i++) {
					if (m.of(t.points().get(i).device(part.getName())) > m.of(t.points().get(best).device(part.getName()))) {
						best = i;
					}
				}
				instants.add(best);
			}
		}
		List<CaseOutcome> outcomes = new ArrayList<>();
		for (int i : instants) {
			DcSolution point = t.points().get(i);
			outcomes.add(new CaseOutcome(c.at(String.format(Locale.ROOT, "%.3g µs", t.times().get(i) * 1e6)), point));
		}
		return outcomes;
	}
}
