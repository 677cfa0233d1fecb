package bulwark.check.rules;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import java.util.stream.Collectors;

import bulwark.check.finding.Concern;
import bulwark.check.finding.Finding;
import bulwark.check.finding.FindingDetail;
import bulwark.check.finding.Locations;
import bulwark.check.finding.Severity;
import bulwark.check.cases.FaultCase;
import bulwark.check.parts.Settings;
import bulwark.check.stress.Overstress;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.OperatingPoint;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.check.figures.Figures;
import bulwark.check.cases.SolvedCase;
import bulwark.check.finding.RuleId;
import bulwark.check.finding.RuleInfo;

/**
 * An abuse at the terminals reaches a part that it pushes over its limit through nothing that blocks it:
 * one of the part's pins connects to the positive terminal and another to the negative one through parts
 * that do not block. What blocks (the list): a diode, LED or zener reverse-biased below its breakdown
 * whose reverse rating holds (a diode without one is given the benefit, and rating-missing says so), an
 * opened fuse, a protector past its trip current, a capacitor (open at DC), and a comparator input drawing no
 * clamp current. The finding gives the path from terminal to terminal through the part, and its stress.
 */
public final class ReversePathRule implements Rule {
	public static final RuleId ID = RuleId.of("reverse-path");
	/** A comparator input drawing less than this has its clamps off [common practice: input leakage is below it]. */
	static final double CONDUCTING = 1e-6;
	/** A junction reverse-biased by more than this blocks [common practice: well clear of forward conduction]. */
	static final double REVERSE_BIASED = 0.1;
	/** A zener within this fraction of its breakdown voltage conducts [common practice: its knee is soft]. */
	static final double BREAKING = 0.9;
	/** A protector at this fraction of its trip current is limiting, not conducting freely [common practice]. */
	static final double TRIPPED = 0.9;
	private static final RuleInfo INFO = new RuleInfo(ID, Concern.REVERSE_PATH, Severity.ERROR,
			"an abuse at the terminals reaches an over-stressed part through nothing that blocks it");

	@Override
	public RuleInfo info() {
		return INFO;
	}

	/** A part's worst reachable overstress so far: the case (its place in the order too) and the path. */
	private record Reach(Overstress over, FaultCase c, List<String> path, long order) {
	}

	@Override
	public RuleReading start(CheckContext context) {
		Map<String, Reach> worst = new HashMap<>();
		return new RuleReading() {
			@Override
			public void read(long order, SolvedCase c) {
				FaultCase fc = c.faultCase();
				if (!fc.isAbuse() || fc.from() == null) {
					return;
				}
				for (Overstress o : Overstress.in(context.design().parts().values(), fc, c.solution(), c.averagePower(),
						context.policy())) {
					Reach previous = worst.get(o.part().getName());
					if (previous != null && (previous.over().utilisation() > o.utilisation()
							|| previous.over().utilisation() == o.utilisation() && previous.order() < order)) {
						continue;
					}
					List<String> path = path(context, c, o.part());
					if (path != null) {
						worst.put(o.part().getName(), new Reach(o, fc, path, order));
					}
				}
			}

			@Override
			public void findings(Consumer<Finding> findings) {
				for (String part : context.design().parts().keySet()) {
					Reach r = worst.get(part);
					if (r != null) {
						findings.accept(finding(r));
					}
				}
			}
		};
	}

	private static Finding finding(Reach r) {
		Overstress o = r.over();
		String message = String.format(Locale.ROOT,
				"case '%s' reaches %s with nothing blocking it: %s; its %s is %s, over %s, %s",
				r.c().name(), o.part().getName(), String.join(" → ", r.path()), o.measure().what(r.c()),
				Figures.over(o.value(), o.limit().value(), o.measure().unit()), o.limit().describe(),
				Figures.ofTheLimit(o.value(), o.limit().value()));
		return Finding.of(INFO, message)
				.about(o.part().getName(), r.c().name(), Locations.of(o.part(), DesignPackage.Literals.MEMBER__NAME))
				.judged(o.measure().rating(), o.value(), o.limit().value(), o.measure().unit())
				.with(new FindingDetail.ReversePath(r.path()));
	}

	/**
	 * The steps of the path a reverse-path finding names — terminals, parts and "net NAME" — in order, for
	 * drawings that highlight it; empty for any other finding.
	 */
	public static List<String> pathOf(Finding f) {
		return f.detail(FindingDetail.ReversePath.class).map(FindingDetail.ReversePath::steps).orElse(List.of());
	}

	/** How a net was reached: from which net, through which device (null at the start). */
	private record Step(int from, String device) {
	}

	/**
	 * The path positive terminal → … → part → … → negative terminal over devices that do not block, the
	 * part itself left out of both searches; null when there is none.
	 */
	private static List<String> path(CheckContext context, SolvedCase c, Part part) {
		Circuit circuit = c.solution().circuit();
		FaultCase fc = c.faultCase();
		int[] pins = circuit.devices().get(circuit.deviceIndex(part.getName())).pins();
		Map<Integer, Step> fromPlus = reach(context, c, circuit.netIndex(terminalNet(context, fc.from())), part);
		Map<Integer, Step> fromMinus = reach(context, c, circuit.netIndex(terminalNet(context, fc.to())), part);
		List<String> shortest = null;
		for (int i = 0; i < pins.length; i++) {
			for (int j = 0; j < pins.length; j++) {
				if (pins[i] != pins[j] && fromPlus.containsKey(pins[i]) && fromMinus.containsKey(pins[j])) {
					List<String> path = new ArrayList<>(trail(circuit, fromPlus, pins[i], fc.from()));
					path.add(part.getName());
					List<String> back = trail(circuit, fromMinus, pins[j], fc.to());
					Collections.reverse(back);
					path.addAll(back);
					if (shortest == null || path.size() < shortest.size()) {
						shortest = path;
					}
				}
			}
		}
		return shortest;
	}

	/** Terminal, then device and net alternately, up to the given net. */
	private static List<String> trail(Circuit circuit, Map<Integer, Step> reached, int net, String terminal) {
		List<String> trail = new ArrayList<>();
		for (int n = net; reached.get(n).device() != null; n = reached.get(n).from()) {
			trail.add("net " + circuit.netName(n));
			trail.add(reached.get(n).device());
		}
		trail.add(terminal);
		Collections.reverse(trail);
		return trail;
	}

	/** Breadth-first from a net over every device that does not block, leaving out the case's own and one part. */
	private static Map<Integer, Step> reach(CheckContext context, SolvedCase c, int start, Part without) {
		DcSolution s = c.solution();
		Circuit circuit = s.circuit();
		Set<String> skip = c.faultCase().added().stream().map(Device::name)
				.collect(Collectors.toCollection(java.util.HashSet::new));
		skip.add(without.getName());
		Map<Integer, Step> reached = new HashMap<>();
		reached.put(start, new Step(-1, null));
		Deque<Integer> queue = new ArrayDeque<>(List.of(start));
		while (!queue.isEmpty()) {
			int net = queue.poll();
			for (Device d : circuit.devices()) {
				int at = indexOf(d.pins(), net);
				if (at < 0 || skip.contains(d.name())) {
					continue;
				}
				OperatingPoint p = s.device(d.name());
				for (int k = 0; k < d.pins().length; k++) {
					int other = d.pins()[k];
					if (k != at && !reached.containsKey(other) && passes(context, c, d, p, at, k)) {
						reached.put(other, new Step(net, d.name()));
						queue.add(other);
					}
				}
			}
		}
		return reached;
	}

	/** Whether the fault passes through the device between two of its pins in this case. */
	private static boolean passes(CheckContext context, SolvedCase c, Device d, OperatingPoint p, int from, int to) {
		Part part = context.design().parts().get(d.name());
		if (part == null) {
			return true; // a device of the circuit's own making
		}
		switch (part.getKind()) {
		case DIODE:
		case LED:
		case ZENER: {
			double reverse = p.reverseVoltage("junction");
			if (reverse <= REVERSE_BIASED) {
				return true;
			}
			if (part.getKind() == PartKind.ZENER) {
				double breakdown = Settings.parameter(part, "breakdown").orElse(Double.POSITIVE_INFINITY);
				return reverse >= BREAKING * breakdown;
			}
			return reverse > Settings.rating(part, "reverse").orElse(Double.POSITIVE_INFINITY);
		}
		case CAPACITOR:
			return false;
		case PROTECTOR:
			return Math.abs(p.current()) < TRIPPED * Settings.parameter(part, "trip").orElse(Double.POSITIVE_INFINITY);
		case FUSE:
		case RESETTABLE_FUSE:
			return !c.faultCase().replaced().containsKey(d.name());
		case COMPARATOR: {
			String a = p.pinNames()[from], b = p.pinNames()[to];
			boolean input = a.startsWith("in_") || b.startsWith("in_");
			String in = a.startsWith("in_") ? a : b;
			return !input || Math.abs(p.pinCurrent(in)) > CONDUCTING && !(a.startsWith("in_") && b.startsWith("in_"));
		}
		default:
			return true;
		}
	}

	private static int indexOf(int[] pins, int net) {
		for (int i = 0; i < pins.length; i++) {
			if (pins[i] == net) {
				return i;
			}
		}
		return -1;
	}

	private static String terminalNet(CheckContext context, String terminal) {
		for (var m : context.design().design().getMembers()) {
			if (m instanceof bulwark.lang.design.Terminal t && t.getName().equals(terminal)) {
				return t.getNet().getName();
			}
		}
		throw new IllegalArgumentException("no terminal " + terminal);
	}
}
