package bulwark.check.cases;

import java.util.AbstractList;
import java.util.List;

/**
 * The outcome of one case: whether it solved, and every part's figures when it did. A design with many
 * terminals has tens of thousands of cases, each with every part's figures, so they are held as plain
 * arrays, not as one object per part; {@link #parts()} shows them as {@link PartStress}es.
 */
public final class CaseResult {
	private final String name;
	private final String kind;
	private final boolean converged;
	private final String[] parts;
	/** Per part: voltage, current, power, utilisation (NaN: no rating to compare with). */
	private final double[] figures;
	private final String[] limiting;

	public CaseResult(String name, String kind, boolean converged, List<PartStress> stresses) {
		this.name = name;
		this.kind = kind;
		this.converged = converged;
		int n = stresses.size();
		parts = new String[n];
		figures = new double[4 * n];
		limiting = new String[n];
		for (int i = 0; i < n; i++) {
			PartStress p = stresses.get(i);
			parts[i] = p.part();
			figures[4 * i] = p.voltage();
			figures[4 * i + 1] = p.current();
			figures[4 * i + 2] = p.power();
			figures[4 * i + 3] = p.utilisation() == null ? Double.NaN : p.utilisation();
			limiting[i] = p.limiting();
		}
	}

	public String name() {
		return name;
	}

	public String kind() {
		return kind;
	}

	public boolean converged() {
		return converged;
	}

	/** Every part's figures in this case, in the design's order; empty when the case did not solve. */
	public List<PartStress> parts() {
		return new AbstractList<>() {
			@Override
			public PartStress get(int i) {
				double u = figures[4 * i + 3];
				return new PartStress(parts[i], figures[4 * i], figures[4 * i + 1], figures[4 * i + 2],
						Double.isNaN(u) ? null : u, limiting[i]);
			}

			@Override
			public int size() {
				return parts.length;
			}
		};
	}

	@Override
	public String toString() {
		return "case '" + name + "' (" + kind + (converged ? ", solved, " : ", not solved, ") + parts.length + " parts)";
	}
}
