package bulwark.check.stress;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import bulwark.check.cases.PartStress;
import bulwark.check.cases.SolvedCase;
import bulwark.check.policy.ReviewPolicy;
import bulwark.engine.solve.OperatingPoint;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * Each part's worst figure of each of its stresses over the cases read so far, with the case it came in,
 * and each part's largest pulse energy. It is read case by case as the cases are solved, so that no case need
 * be kept: a design with many terminals has tens of thousands of them. A tie goes to the case earlier in the
 * check's order, whichever was read first.
 */
public final class WorstFigures {
	/** One worst figure, the case it came in, and what it is called there ("average power over the cycle"). */
	public record Worst(double value, String caseName, String what, long order) {
		boolean beatenBy(double v, long otherOrder) {
			return v > value || v == value && otherOrder < order;
		}
	}

	private final List<Part> parts;
	private final Map<String, Worst[]> stresses = new HashMap<>();
	private final Map<String, PartKind> kinds = new HashMap<>();
	private final Map<String, Worst> pulses = new HashMap<>();

	public WorstFigures(List<Part> parts) {
		this.parts = List.copyOf(parts);
		for (Part p : parts) {
			stresses.put(p.getName(), new Worst[StressCatalog.of(p.getKind()).size()]);
			kinds.put(p.getName(), p.getKind());
		}
	}

	/**
	 * Takes in one solved case ({@code order} is its place in the check's order) and gives every part's figures
	 * in it with its utilisation — the largest of its judged stresses over the derated limit of the same name —
	 * each figure worked out once for both.
	 */
	public List<PartStress> read(long order, SolvedCase c, ReviewPolicy policy) {
		List<PartStress> figures = new ArrayList<>(parts.size());
		for (Part part : parts) {
			String name = part.getName();
			List<Measure> measures = StressCatalog.of(part.getKind());
			Worst[] worst = stresses.get(name);
			OperatingPoint point = c.solution().device(name);
			Double utilisation = null;
			String limiting = null;
			for (int i = 0; i < worst.length; i++) {
				Measure m = measures.get(i);
				double v = m.judged(c.faultCase(), point, c.averagePower(), name);
				if (Double.isNaN(v)) {
					continue;
				}
				if (worst[i] == null || worst[i].beatenBy(v, order)) {
					worst[i] = new Worst(v, c.faultCase().name(), m.what(c.faultCase()), order);
				}
				Optional<Limit> limit = Limits.of(part, m, policy);
				if (limit.isPresent() && (utilisation == null || v / limit.get().value() > utilisation)) {
					utilisation = v / limit.get().value();
					limiting = m.rating();
				}
			}
			figures.add(new PartStress(name, point.voltage(), point.current(), point.power(), utilisation, limiting));
			Double e = c.pulseEnergy().get(name);
			if (e != null && (!pulses.containsKey(name) || pulses.get(name).beatenBy(e, order))) {
				pulses.put(name, new Worst(e, c.faultCase().name(), "pulse energy", order));
			}
		}
		return figures;
	}

	/** The part's worst figure of this stress over every case read; empty when no case judged it. */
	public Optional<Worst> of(String part, Measure stress) {
		Worst[] worst = stresses.get(part);
		if (worst == null) {
			return Optional.empty();
		}
		int i = StressCatalog.of(kinds.get(part)).indexOf(stress);
		return i < 0 ? Optional.empty() : Optional.ofNullable(worst[i]);
	}

	/** The largest energy the part absorbed in one pulse (a surge, an inrush, a fuse's clearing); empty if none. */
	public Optional<Worst> pulse(String part) {
		return Optional.ofNullable(pulses.get(part));
	}
}
