package bulwark.check.compile;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import bulwark.check.policy.ReviewPolicy;
import bulwark.check.figures.Figures;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.source.CombinationWave;
import bulwark.engine.source.Sine;
import bulwark.lang.design.Action;
import bulwark.lang.design.Apply;
import bulwark.lang.design.Case;
import bulwark.lang.design.Connect;
import bulwark.lang.design.Member;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.lang.design.Terminal;
import bulwark.lang.units.Quantities;
import bulwark.check.cases.FaultCase;
import bulwark.check.cases.CaseKind;

/**
 * The cases a design is checked under: the normal condition (terminals open, then each terminal shorted to
 * the common one), the designer's own cases, and the abuse the review policy names — across every pair of
 * terminals, each mains system as its sine at the highest amplitude (both polarities are in its cycle) and
 * each DC level in both polarities — and every battery put in backwards, and each surge the policy names
 * (IEC 61000-4-5 combination wave, both polarities, solved as a transient). Mains comes from an ideal source,
 * with nothing of the supply's impedance to help; MainsRunner solves it over the cycle.
 */
public final class CaseGenerator {
	private CaseGenerator() {
	}

	/** A generated short across two terminals, Ω [closed form: far below any probe or lead resistance]. */
	static final double SHORT_OHMS = 1e-3;

	public static List<FaultCase> cases(CompiledDesign design, ReviewPolicy policy) {
		List<FaultCase> cases = new ArrayList<>();
		cases.add(FaultCase.normalOpen());
		List<Terminal> terminals = usableTerminals(design);
		Terminal common = terminals.stream().filter(Terminal::isCommon).findFirst().orElse(null);
		if (common != null) {
			for (Terminal t : terminals) {
				if (t != common && t.getNet() != common.getNet()) {
					// a short of a small resistance, not an ideal one: across an ideal source of the design's own an
					// ideal short would close a loop of ideal sources that no case can solve
					cases.add(new FaultCase("normal, " + t.getName() + " shorted to " + common.getName(), CaseKind.NORMAL,
							List.of(new Resistor("short " + t.getName() + " " + common.getName(), net(design, t),
									net(design, common), SHORT_OHMS))));
				}
			}
		}
		for (Member m : design.design().getMembers()) {
			if (m instanceof Case c) {
				Apply sine = c.getActions().stream().filter(a -> a instanceof Apply ap && ap.getFrequency() != null)
						.map(a -> (Apply) a).findFirst().orElse(null);
				cases.add(sine == null ? new FaultCase(c.getName(), CaseKind.DESIGNER, devices(design.circuit(), c))
						: new FaultCase(c.getName(), CaseKind.DESIGNER_SINE, devices(design.circuit(), c), Map.of(),
								sine.getFrom().getName(), sine.getTo().getName()));
			}
		}
		for (int i = 0; i < terminals.size(); i++) {
			for (int j = i + 1; j < terminals.size(); j++) {
				Terminal a = terminals.get(i), b = terminals.get(j);
				if (a.getNet() == b.getNet()) {
					continue;
				}
				for (ReviewPolicy.MainsSystem mains : policy.mains()) {
					cases.add(mains(design, mains, a, b));
				}
				for (ReviewPolicy.SurgeLevel surge : policy.surges()) {
					String what = "surge " + Figures.engineering(surge.peakVolts(), "V") + " behind "
							+ Figures.engineering(surge.sourceOhms(), "Ω");
					cases.add(surge(design, what, a, b, surge));
					cases.add(surge(design, what, b, a, surge));
				}
				for (double level : policy.levels()) {
					String what = Figures.engineering(level, "V") + " DC";
					cases.add(abuse(design, what, a, b, level));
					cases.add(abuse(design, what, b, a, level));
				}
			}
		}
		for (Part part : design.parts().values()) {
			if (part.getKind() == PartKind.BATTERY) {
				VoltageSource fitted = (VoltageSource) design.circuit().devices()
						.get(design.circuit().deviceIndex(part.getName()));
				// the same pins, the EMF turned round: what a cell put in backwards does
				VoltageSource reversed = new VoltageSource(part.getName(), fitted.pins()[0], fitted.pins()[1],
						-fitted.volts(), fitted.seriesOhms());
				cases.add(new FaultCase("battery " + part.getName() + " reversed", CaseKind.ABUSE, List.of(),
						Map.of(part.getName(), reversed), null, null));
			}
		}
		return cases;
	}

	/**
	 * Terminals whose net some pin uses: a terminal that leads nowhere cannot be driven (the language
	 * warns about it).
	 */
	private static List<Terminal> usableTerminals(CompiledDesign design) {
		List<Terminal> terminals = new ArrayList<>();
		for (Member m : design.design().getMembers()) {
			if (m instanceof Terminal t && t.getNet() != null && design.usedNets().contains(t.getNet().getName())) {
				terminals.add(t);
			}
		}
		return terminals;
	}

	/**
	 * One polarity of one abuse across one pair. The source always sits on the same two nets in the same
	 * order, so that both polarities and every level share one prepared circuit; the sign carries the polarity.
	 */
	private static FaultCase abuse(CompiledDesign design, String what, Terminal plus, Terminal minus, double volts) {
		Terminal first = order(plus, minus) ? plus : minus, second = first == plus ? minus : plus;
		double signed = first == plus ? volts : -volts;
		return new FaultCase(what + ", " + plus.getName() + " + to " + minus.getName() + " −", CaseKind.ABUSE,
				List.of(VoltageSource.ideal(pairSource(first, second), net(design, first), net(design, second), signed)),
				Map.of(), plus.getName(), minus.getName());
	}

	/**
	 * Mains across one pair: an ideal sine of the system's highest amplitude and its frequency, on the same
	 * nets in the same order as the pair's other cases, positive at the first terminal in its first half-cycle.
	 */
	private static FaultCase mains(CompiledDesign design, ReviewPolicy.MainsSystem mains, Terminal a, Terminal b) {
		Terminal first = order(a, b) ? a : b, second = first == a ? b : a;
		String what = String.format(Locale.ROOT, "%s %s mains (%s peak)", Figures.engineering(mains.nominalVolts(), "V"),
				Figures.engineering(mains.hertz(), "Hz"), Figures.engineering(mains.peakVolts(), "V"));
		return new FaultCase(what, CaseKind.MAINS,
				List.of(new VoltageSource(pairSource(first, second), net(design, first), net(design, second),
						new Sine(0, mains.peakVolts(), mains.hertz(), 0), 0)),
				Map.of(), first.getName(), second.getName());
	}

	/** A 1.2/50 µs combination wave from its generator impedance, positive at {@code plus}. */
	private static FaultCase surge(CompiledDesign design, String what, Terminal plus, Terminal minus,
			ReviewPolicy.SurgeLevel surge) {
		Terminal first = order(plus, minus) ? plus : minus, second = first == plus ? minus : plus;
		double signed = first == plus ? surge.peakVolts() : -surge.peakVolts();
		return new FaultCase(what + ", " + plus.getName() + " + to " + minus.getName() + " −", CaseKind.SURGE,
				List.of(new VoltageSource("surge " + first.getName() + " " + second.getName(), net(design, first),
						net(design, second), new CombinationWave(signed, 0), surge.sourceOhms())),
				Map.of(), plus.getName(), minus.getName());
	}

	private static boolean order(Terminal a, Terminal b) {
		return a.getName().compareTo(b.getName()) < 0;
	}

	/** Names contain spaces, so no part can share them. */
	private static String pairSource(Terminal a, Terminal b) {
		Terminal first = order(a, b) ? a : b, second = first == a ? b : a;
		return "at " + first.getName() + " " + second.getName();
	}

	private static int net(CompiledDesign design, Terminal t) {
		return design.circuit().netIndex(t.getNet().getName());
	}

	/** The devices a designer's case adds at the terminals. */
	private static List<Device> devices(Circuit circuit, Case c) {
		List<Device> added = new ArrayList<>();
		int k = 0;
		for (Action action : c.getActions()) {
			String name = "case " + c.getName() + " #" + ++k;
			int from = circuit.netIndex(action.getFrom().getNet().getName());
			int to = circuit.netIndex(action.getTo().getNet().getName());
			if (action instanceof Apply a && a.getFrequency() != null) {
				// the RMS value of a sine, its amplitude √2 times that
				double ohms = a.getResistance() == null ? 0 : Quantities.si(a.getResistance()).orElseThrow();
				double amplitude = Quantities.si(a.getValue()).orElseThrow() * Math.sqrt(2);
				added.add(new VoltageSource(name, from, to,
						new Sine(0, amplitude, Quantities.si(a.getFrequency()).orElseThrow(), 0), ohms));
			} else if (action instanceof Apply a) {
				double ohms = a.getResistance() == null ? 0 : Quantities.si(a.getResistance()).orElseThrow();
				added.add(new VoltageSource(name, from, to, Quantities.si(a.getValue()).orElseThrow(), ohms));
			} else if (action instanceof Connect cn) {
				added.add(new Resistor(name, from, to, Quantities.si(cn.getValue()).orElseThrow()));
			} else {
				added.add(VoltageSource.ideal(name, from, to, 0)); // a wire: 0 V, any current
			}
		}
		return added;
	}
}
