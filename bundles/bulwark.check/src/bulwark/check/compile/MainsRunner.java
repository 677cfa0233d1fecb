package bulwark.check.compile;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;

import bulwark.check.figures.Figures;
import bulwark.check.parts.FuseRatings;
import bulwark.check.stress.Measure;
import bulwark.check.stress.StressCatalog;
import bulwark.engine.circuit.Capacitor;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.Inductor;
import bulwark.engine.circuit.Fuse;
import bulwark.engine.circuit.VoltageSource;
import bulwark.engine.solve.DcResult;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.DcSolver;
import bulwark.engine.solve.PeriodicSteadyState;
import bulwark.engine.solve.PreparedCircuit;
import bulwark.engine.solve.SolveFailure;
import bulwark.engine.solve.TransientResult;
import bulwark.engine.solve.TransientSolver;
import bulwark.engine.source.Sine;
import bulwark.engine.source.SwitchedSine;
import bulwark.lang.design.Part;
import bulwark.check.cases.FaultCase;
import bulwark.check.cases.CaseKind;
import bulwark.check.cases.CaseOutcome;
import bulwark.check.cases.SolvedCycle;

/**
 * Solves a mains case as the sine it is, across its pair of terminals, over the cycle.
 * <ul>
 * <li>A circuit with no capacitor or inductor has no memory of the cycle, so a quasi-static sweep is exact:
 * one operating point every {@link #PHASE_STEP_DEGREES}°, each continued from the last (the crests at 90°
 * and 270° are among them). A protector's trip delay is not memory of the cycle: against a 50 Hz sine
 * it is tripped within a microsecond of each rise; what passes during the delay of a fast rise is what the
 * policy's surge cases examine.</li>
 * <li>A circuit with capacitors or inductors is switched on at each crest from rest — where capacitors draw
 * their inrush — and run for {@link #SWITCH_ON_PERIODS} periods; then, from the positive switch-on, whole
 * periods are integrated until the state repeats ({@link PeriodicSteadyState}), at most
 * {@link #MAX_PERIODS}. A case that does not settle is a failure with its reason, never a pass.</li>
 * </ul>
 * As for a surge, the instants that matter become outcomes of their own: for every part and every stress,
 * the instant where it peaks, named with the terminal positive then. A power rating is thermal: it is judged
 * on each part's power averaged over the steady cycle, carried by an outcome named for the cycle as a whole. A fuse whose RMS
 * current over the steady cycle exceeds its rating (fuse ratings are RMS) opens once it has taken in its
 * pre-arcing I²t; what the parts take until then is judged (see beforeClearing), and the case is solved again
 * with it open.
 */
final class MainsRunner {
	/**
	 * Spacing of the quasi-static sweep: 36 points a cycle, crests and zero crossings included; equally spaced
	 * samples average sin² exactly [closed form], and a stress that peaks between two of them is within
	 * 1 − cos 5° = 0.4 % of its peak there.
	 */
	static final int PHASE_STEP_DEGREES = 10;
	/** Largest step of a transient, as a fraction of the period; the error control shortens it. */
	static final int STEPS_PER_PERIOD = 100;
	/**
	 * First step of a switch-on, as a fraction of the period: 20 ns at 50 Hz, so the instant after the switch
	 * closes is seen within e^(−h/RC) of itself for any RC above a few microseconds.
	 */
	static final double FIRST_STEP = 1e-6;
	/** Periods of the switch-on run: the inrush and its first recovery. */
	static final int SWITCH_ON_PERIODS = 2;
	/** Periods integrated at most after the switch-on to reach the steady state. */
	static final int MAX_PERIODS = 200;

	private MainsRunner() {
	}

	/** The source of the case that carries its sine. */
	static VoltageSource source(FaultCase c) {
		for (Device d : c.added()) {
			if (d instanceof VoltageSource v && v.waveform() instanceof Sine) {
				return v;
			}
		}
		throw new IllegalArgumentException("case '" + c.name() + "' has no sine to solve over");
	}

	/** The waveform of a mains case's source: its amplitude and frequency. */
	static Sine sine(FaultCase c) {
		return (Sine) source(c).waveform();
	}

	static List<CaseOutcome> run(CompiledDesign design, FaultCase c, PreparedCircuit circuit, DcSolver solver) {
		Map<String, Device> opened = new LinkedHashMap<>();
		List<CaseOutcome> outcomes = new ArrayList<>();
		while (true) {
			FaultCase named = opened.isEmpty() ? c : CaseRunner.withOpened(c, opened);
			boolean reactive = circuit.circuit().devices().stream()
					.anyMatch(d -> d instanceof Capacitor || d instanceof Inductor);
			Run run = reactive ? transientRun(design, named, circuit, solver) : quasiStatic(design, named, circuit, solver);
			if (run.failed()) {
				outcomes.addAll(run.outcomes);
				return outcomes;
			}
			List<Fuse> opening = new ArrayList<>();
			for (Device d : circuit.circuit().devices()) {
				if (d instanceof Fuse f && !opened.containsKey(f.name()) && rms(run.steady, f.name()) > f.ratedAmps()) {
					opening.add(f);
				}
			}
			if (opening.isEmpty()) {
				outcomes.addAll(run.outcomes);
				return outcomes;
			}
			outcomes.addAll(beforeClearing(design, named, run, opening));
			for (Fuse f : opening) {
				Fuse open = CaseRunner.opened(f);
				opened.put(f.name(), open);
				circuit = circuit.with(f.name(), open);
			}
		}
	}

	/**
	 * What the parts take while the fuses that will open are still whole: from switching on at the crest
	 * until the slowest of them has taken in its pre-arcing I²t (a fuse opens then, not at once). Each
	 * stress's instantaneous peak in that interval is judged as an instant of its own, and each part's energy
	 * over it rides on one outcome for the pulse ratings. Power ratings are not judged on it: they are
	 * thermal, and the interval is short; what it costs a part is its energy.
	 */
	private static List<CaseOutcome> beforeClearing(CompiledDesign design, FaultCase c, Run run, List<Fuse> opening) {
		double clears = 0;
		double largestI2t = 0;
		for (Fuse f : opening) {
			double i2t = FuseRatings.preArcingI2t(design.parts().get(f.name()), f.ratedAmps());
			clears = Math.max(clears, clearingSeconds(run, f.name(), i2t));
			largestI2t = Math.max(largestI2t, i2t);
		}
		Cycle window = run.switchOn.upTo(clears);
		String stage = ", " + FuseRatings.beforeClearing(opening, largestI2t, clears);
		VoltageSource source = source(c);
		List<CaseOutcome> outcomes = new ArrayList<>(instants(design, c, stage, window, source, Map.of(), null));
		Map<String, Double> energy = new LinkedHashMap<>();
		for (String part : design.parts().keySet()) {
			energy.put(part, energyBefore(run, part, clears));
		}
		FaultCase whole = c.momentarily(c.name() + stage);
		outcomes.add(new CaseOutcome(whole, run.switchOn.points.get(0), energy));
		return outcomes;
	}

	/**
	 * When a fuse has taken in the given ∫i²dt since switching on at the crest: along the switch-on run by the
	 * trapezoidal rule, after it at the steady cycle's mean square [closed form: ∫i²dt = I_rms²·t over whole
	 * periods].
	 */
	private static double clearingSeconds(Run run, String fuse, double i2t) {
		Cycle on = run.switchOn;
		double taken = 0;
		for (int k = 1; k < on.points.size(); k++) {
			double dt = on.times.get(k) - on.times.get(k - 1);
			double a = square(on, fuse, k - 1), b = square(on, fuse, k);
			double step = 0.5 * (a + b) * dt;
			if (taken + step >= i2t) {
				return on.times.get(k - 1) + dt * (i2t - taken) / step;
			}
			taken += step;
		}
		double meanSquare = Math.pow(rms(run.steady, fuse), 2);
		return on.times.get(on.points.size() - 1) + (i2t - taken) / meanSquare;
	}

	private static double square(Cycle cycle, String device, int k) {
		double i = cycle.points.get(k).device(device).current();
		return i * i;
	}

	/** A part's energy from switching on until the given time: the switch-on run, then the steady average power. */
	private static double energyBefore(Run run, String part, double seconds) {
		Cycle on = run.switchOn;
		double energy = 0;
		for (int k = 1; k < on.points.size(); k++) {
			double t0 = on.times.get(k - 1), t1 = on.times.get(k);
			if (t0 >= seconds) {
				return energy;
			}
			double p0 = Math.abs(on.points.get(k - 1).device(part).power()), p1 = Math.abs(on.points.get(k).device(part).power());
			double end = Math.min(t1, seconds);
			double pEnd = p0 + (p1 - p0) * (end - t0) / (t1 - t0);
			energy += 0.5 * (p0 + pEnd) * (end - t0);
		}
		double last = on.times.get(on.points.size() - 1);
		double average = mean(run.steady, k -> Math.abs(run.steady.points.get(k).device(part).power()));
		return energy + Math.max(0, seconds - last) * average;
	}

	/**
	 * The outcomes of one waveform run, the steady cycle they came from (null when it failed), and the run from
	 * switching on at a crest, times from the switch (a sweep's cycle from its crest, as a memoryless circuit
	 * switched on there follows it at once).
	 */
	private record Run(List<CaseOutcome> outcomes, Cycle steady, Cycle switchOn) {
		boolean failed() {
			return steady == null;
		}
	}

	/**
	 * Solved points over a stretch of the waveform with their times; {@code evenlySpaced} for a sweep's phases,
	 * which cover one period and are averaged by their mean.
	 */
	private record Cycle(List<Double> times, List<DcSolution> points, double start, boolean evenlySpaced) {
		/** The points up to the given time from the start, at least the first. */
		Cycle upTo(double seconds) {
			int n = 1;
			while (n < points.size() && times.get(n) - start <= seconds) {
				n++;
			}
			return new Cycle(times.subList(0, n), points.subList(0, n), start, false);
		}

		/** The same points from the i-th on, then the first ones again a period later, ending where it began. */
		Cycle fromIndex(int i, double period) {
			List<Double> t = new ArrayList<>();
			List<DcSolution> p = new ArrayList<>();
			int n = points.size();
			for (int k = 0; k <= n; k++) {
				int j = (i + k) % n;
				t.add(times.get(j) - times.get(i) + (i + k >= n ? period : 0));
				p.add(points.get(j));
			}
			return new Cycle(t, p, 0, false);
		}
	}

	private static Run quasiStatic(CompiledDesign design, FaultCase c, PreparedCircuit circuit, DcSolver solver) {
		Sine sine = sine(c);
		VoltageSource source = source(c);
		List<Double> times = new ArrayList<>();
		List<DcSolution> points = new ArrayList<>();
		DcSolution previous = null;
		double period = 1 / sine.hertz();
		for (int degrees = 0; degrees < 360; degrees += PHASE_STEP_DEGREES) {
			double t = period * degrees / 360.0;
			double volts = sine.amplitude() * Math.sin(Math.toRadians(degrees));
			PreparedCircuit at = circuit.with(source.name(),
					new VoltageSource(source.name(), source.pins()[0], source.pins()[1], volts, source.seriesOhms()));
			DcResult r = previous == null ? solver.solve(at) : solver.solve(at, previous);
			if (!(r instanceof DcSolution s)) {
				return failed(c, String.format(Locale.ROOT, "%d°", degrees), (SolveFailure) r);
			}
			times.add(t);
			points.add(s);
			previous = s;
		}
		Cycle cycle = new Cycle(times, points, 0, true);
		Cycle fromCrest = cycle.fromIndex(90 / PHASE_STEP_DEGREES, period);
		String method = String.format(Locale.ROOT, "quasi-static sweep of %d operating points, each continued from the last",
				points.size());
		return new Run(instants(design, c, "", cycle, source, averagePower(design, cycle), method), cycle, fromCrest);
	}

	private static Run transientRun(CompiledDesign design, FaultCase c, PreparedCircuit circuit, DcSolver solver) {
		Sine sine = sine(c);
		VoltageSource source = source(c);
		double period = 1 / sine.hertz();
		double maxStep = period / STEPS_PER_PERIOD;
		TransientSolver transients = new TransientSolver(solver);
		List<CaseOutcome> outcomes = new ArrayList<>();
		Cycle steady = null;
		Cycle switchOn = null;
		Map<Double, Cycle> switchOns = new LinkedHashMap<>();
		Map<Double, VoltageSource> sources = new LinkedHashMap<>();
		for (double sign : new double[] { 1, -1 }) {
			VoltageSource switched = new VoltageSource(source.name(), source.pins()[0], source.pins()[1],
					new SwitchedSine(sign * sine.amplitude(), sine.hertz()), source.seriesOhms());
			PreparedCircuit on = circuit.with(source.name(), switched);
			TransientResult t = transients.run(on, SWITCH_ON_PERIODS * period, maxStep, period * FIRST_STEP);
			String stage = "switched on at the crest";
			if (!t.completed()) {
				return failed(c, stage, t.failure());
			}
			Cycle first = new Cycle(t.times(), t.points(), 0, false);
			outcomes.addAll(instants(design, c, ", " + stage, first, switched, Map.of(), null));
			switchOns.put(sign, first);
			sources.put(sign, switched);
			if (sign > 0) {
				switchOn = first;
				PeriodicSteadyState.Result r = new PeriodicSteadyState(transients).run(on, t, period, maxStep,
						MAX_PERIODS);
				if (!r.settled()) {
					return failed(c, "steady state", r.failure());
				}
				TransientResult p = r.period();
				steady = new Cycle(p.times(), p.points(), p.times().get(0), false);
				String settled = String.format(Locale.ROOT, ", steady state after %d period(s)", r.periods());
				String method = String.format(Locale.ROOT, "transient analysis from switch-on, steady after %d period(s): "
						+ "whole periods integrated until every net ends a period within %.2g %% of the largest voltage + %s "
						+ "of where it ended the last", r.periods(), PeriodicSteadyState.RELATIVE * 100,
						Figures.engineering(PeriodicSteadyState.VOLTS, "V"));
				outcomes.addAll(0, instants(design, c, settled, steady, switched, averagePower(design, steady), method));
			}
		}
		for (var e : switchOns.entrySet()) {
			// the inrush as a pulse: each part's energy over the switch-on beyond what the steady cycle gives it
			boolean firstPositive = e.getKey() > 0;
			FaultCase inrush = new FaultCase(c.name() + ", switched on at the crest", c.kind(), c.added(), c.replaced(),
					firstPositive ? c.from() : c.to(), firstPositive ? c.to() : c.from());
			Map<String, Double> energy = new LinkedHashMap<>();
			for (String part : design.parts().keySet()) {
				energy.put(part, inrushEnergy(e.getValue(), steady, part, period));
			}
			outcomes.add(new CaseOutcome(inrush, e.getValue().points.get(0), energy));
		}
		return new Run(outcomes, steady, switchOn);
	}

	/**
	 * A part's switch-on pulse: its energy over the switch-on run less what the steady cycle, at the same phase,
	 * would have given it then, ∫(|p| − |p_ss|)dt, never below nought. For a discharged capacitor charged through
	 * a resistor this is the ½·C·V² the resistor takes [closed form, RC charging], whatever the steady current.
	 */
	private static double inrushEnergy(Cycle on, Cycle steady, String part, double period) {
		double excess = 0;
		for (int k = 1; k < on.points.size(); k++) {
			double t0 = on.times.get(k - 1), t1 = on.times.get(k);
			double a = Math.abs(on.points.get(k - 1).device(part).power()) - steadyPower(steady, part, t0, period);
			double b = Math.abs(on.points.get(k).device(part).power()) - steadyPower(steady, part, t1, period);
			excess += 0.5 * (a + b) * (t1 - t0);
		}
		return Math.max(0, excess);
	}

	/** |p| of a part in the steady cycle at the phase of time t (the cycle starts a whole number of periods on). */
	private static double steadyPower(Cycle steady, String part, double t, double period) {
		double phase = ((t % period) + period) % period;
		List<Double> times = steady.times;
		double start = times.get(0);
		// the first point at or after the phase, by bisection (the cycle's times increase)
		int lo = 1, hi = times.size() - 1;
		while (lo < hi) {
			int mid = (lo + hi) >>> 1;
			if (times.get(mid) - start < phase) {
				lo = mid + 1;
			} else {
				hi = mid;
			}
		}
		int k = lo;
		double ta = times.get(k - 1) - start, tb = times.get(k) - start;
		double pa = Math.abs(steady.points.get(k - 1).device(part).power());
		double pb = Math.abs(steady.points.get(k).device(part).power());
		double w = tb > ta ? Math.min(1, Math.max(0, (phase - ta) / (tb - ta))) : 0;
		return pa + w * (pb - pa);
	}

	/** The case named with where it stopped, and why. */
	private static Run failed(FaultCase c, String where, SolveFailure failure) {
		return new Run(List.of(new CaseOutcome(new FaultCase(c.name() + ", " + where, c.kind(), c.added(),
				c.replaced(), c.from(), c.to()), failure)), null, null);
	}

	/**
	 * One outcome per instant where some stress of some part peaks over the cycle, and the source's crest;
	 * then, when averages are given, one outcome for the cycle as a whole, named without an instant, which
	 * carries them (its solution and polarity are the crest's, so it adds no instantaneous figure of its own;
	 * a path to a part whose average power is over its limit is traced at the crest).
	 */
	private static List<CaseOutcome> instants(CompiledDesign design, FaultCase c, String stage, Cycle cycle,
			VoltageSource source, Map<String, Double> averages, String method) {
		TreeSet<Integer> chosen = new TreeSet<>();
		int crest = 0;
		for (int i = 1; i < cycle.points.size(); i++) {
			if (Math.abs(sourceVolts(cycle, source, i)) > Math.abs(sourceVolts(cycle, source, crest))) {
				crest = i;
			}
		}
		chosen.add(crest);
		Circuit circuit = cycle.points.get(0).circuit();
		for (Part part : design.parts().values()) {
			int device = circuit.deviceIndex(part.getName());
			for (Measure m : StressCatalog.of(part.getKind())) {
				if (!m.appliesIn(c, part.getName())) {
					continue;
				}
				int best = 0;
				double bestValue = Double.NEGATIVE_INFINITY;
				for (int i = 0; i < cycle.points.size(); i++) {
					double v = m.of(cycle.points.get(i).device(device));
					if (v > bestValue) {
						bestValue = v;
						best = i;
					}
				}
				chosen.add(best);
			}
		}
		FaultCase staged = new FaultCase(c.name() + stage, c.kind(), c.added(), c.replaced(), c.from(), c.to());
		List<CaseOutcome> outcomes = new ArrayList<>();
		for (int i : chosen) {
			boolean firstPositive = sourceVolts(cycle, source, i) >= 0;
			String instant = Figures.engineering(cycle.times.get(i) - cycle.start, "s");
			FaultCase at = firstPositive ? staged.at(instant, c.from(), c.to()) : staged.at(instant, c.to(), c.from());
			outcomes.add(new CaseOutcome(at, cycle.points.get(i)));
		}
		if (!averages.isEmpty()) {
			boolean firstPositive = sourceVolts(cycle, source, crest) >= 0;
			// a generated one named for its pair of terminals (a design with many has one per pair); a designer's
			// case keeps the designer's name
			String plus = firstPositive ? c.from() : c.to(), minus = firstPositive ? c.to() : c.from();
			String name = c.kind() != CaseKind.MAINS || plus == null ? staged.name()
					: staged.name() + ", between " + plus + " and " + minus;
			FaultCase whole = new FaultCase(name, c.kind(), c.added(), c.replaced(), plus, minus);
			List<Double> fromStart = cycle.times.stream().map(t -> t - cycle.start).toList();
			outcomes.add(new CaseOutcome(whole, cycle.points.get(crest), Map.of(), averages,
					new SolvedCycle(fromStart, cycle.points, method)));
		}
		return outcomes;
	}

	/** The source's EMF at the i-th point, positive when the case's first terminal is positive. */
	private static double sourceVolts(Cycle cycle, VoltageSource source, int i) {
		return cycle.points.get(i).device(source.name()).voltage();
	}

	/**
	 * Each part's power averaged over the cycle: the mean of equally spaced phases (exact for the trigonometric
	 * content a sweep resolves), or the trapezoidal rule over a transient's accepted points, over the period.
	 */
	private static Map<String, Double> averagePower(CompiledDesign design, Cycle cycle) {
		int n = cycle.points.size();
		Map<String, double[]> powers = new LinkedHashMap<>();
		for (String part : design.parts().keySet()) {
			powers.put(part, new double[n]);
		}
		Circuit circuit = cycle.points.get(0).circuit();
		for (var e : powers.entrySet()) {
			int device = circuit.deviceIndex(e.getKey());
			double[] p = e.getValue();
			for (int i = 0; i < n; i++) {
				p[i] = cycle.points.get(i).device(device).power();
			}
		}
		Map<String, Double> average = new LinkedHashMap<>();
		for (var e : powers.entrySet()) {
			double[] p = e.getValue();
			average.put(e.getKey(), mean(cycle, i -> p[i]));
		}
		return average;
	}

	/** RMS of a device's current over the cycle (its first pin's). */
	private static double rms(Cycle cycle, String device) {
		return Math.sqrt(mean(cycle, k -> {
			double i = cycle.points.get(k).device(device).current();
			return i * i;
		}));
	}

	/** The mean over the cycle of a figure given by point index. */
	private static double mean(Cycle cycle, java.util.function.IntToDoubleFunction f) {
		int n = cycle.points.size();
		if (cycle.evenlySpaced) {
			double sum = 0;
			for (int i = 0; i < n; i++) {
				sum += f.applyAsDouble(i);
			}
			return sum / n;
		}
		double integral = 0;
		for (int i = 1; i < n; i++) {
			integral += 0.5 * (f.applyAsDouble(i - 1) + f.applyAsDouble(i)) * (cycle.times.get(i) - cycle.times.get(i - 1));
		}
		return integral / (cycle.times.get(n - 1) - cycle.times.get(0));
	}
}
