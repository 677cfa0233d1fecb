package bulwark.check.policy;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import bulwark.check.finding.RuleId;
import bulwark.check.finding.Severity;
import bulwark.lang.design.PartKind;

/**
 * The team lead's review policy, resolved to SI values: which abuse to apply at the terminals, how much of
 * each rating a part may use, how much hysteresis a comparator must have, which rules are raised or lowered,
 * what every waiver must carry, and how Monte Carlo draws toleranced values. {@link DefaultPolicy} gives the values used when no policy is named.
 */
public record ReviewPolicy(String title, Abuse abuse, Map<RatingKey, Derating> derating, HysteresisMinimum hysteresis,
		Map<RuleId, Severity> severities, WaiverDemands waivers, Distribution distribution) {

	public ReviewPolicy {
		derating = Map.copyOf(derating);
		severities = Map.copyOf(severities);
	}

	/** The abuse applied at every pair of terminals: mains systems, DC levels (V) and surges. */
	public record Abuse(List<MainsSystem> mains, List<Double> levels, List<SurgeLevel> surges) {
		public static final Abuse NONE = new Abuse(List.of(), List.of(), List.of());

		public Abuse {
			mains = List.copyOf(mains);
			levels = List.copyOf(levels);
			surges = List.copyOf(surges);
		}
	}

	/** The least hysteresis a comparator must have, as a voltage at its input or as a resistance at the terminals. */
	public record HysteresisMinimum(Optional<Double> volts, Optional<Double> ohms) {
	}

	/** What every waiver must carry. */
	public record WaiverDemands(boolean justification, boolean name) {
	}

	/** The same policy under another title with other abuse. */
	public ReviewPolicy with(String otherTitle, Abuse otherAbuse) {
		return new ReviewPolicy(otherTitle, otherAbuse, derating, hysteresis, severities, waivers, distribution);
	}

	/** The same policy with one rule's severity set. */
	public ReviewPolicy withSeverity(RuleId rule, Severity severity) {
		Map<RuleId, Severity> changed = new java.util.HashMap<>(severities);
		changed.put(rule, severity);
		return new ReviewPolicy(title, abuse, derating, hysteresis, changed, waivers, distribution);
	}

	/** The same policy with no derating: every part may use all of each rating. */
	public ReviewPolicy notDerated() {
		return new ReviewPolicy(title, abuse, Map.of(), hysteresis, severities, waivers, distribution);
	}

	public List<MainsSystem> mains() {
		return abuse.mains();
	}

	public List<Double> levels() {
		return abuse.levels();
	}

	public List<SurgeLevel> surges() {
		return abuse.surges();
	}

	public Optional<Double> minimumHysteresisVolts() {
		return hysteresis.volts();
	}

	public Optional<Double> minimumHysteresisOhms() {
		return hysteresis.ohms();
	}

	public boolean waiverNeedsJustification() {
		return waivers.justification();
	}

	public boolean waiverNeedsName() {
		return waivers.name();
	}

	/**
	 * A mains system: its nominal RMS voltage, supply tolerance and frequency. It is applied as a sine at its
	 * highest amplitude, nominal × (1 + tolerance) × √2.
	 */
	public record MainsSystem(double nominalVolts, double tolerancePercent, double hertz) {
		/** A system at the frequency of systems of its voltage. */
		public MainsSystem(double nominalVolts, double tolerancePercent) {
			this(nominalVolts, tolerancePercent, frequencyOf(nominalVolts));
		}

		public double peakVolts() {
			return nominalVolts * (1 + tolerancePercent / 100) * Math.sqrt(2);
		}

		/**
		 * The frequency IEC 60038 gives systems of this voltage: 60 Hz for the 100–150 V systems (120/208 V,
		 * 120/240 V), 50 Hz for the others (230/400 V) [published, docs/sources.md#mains-and-surges].
		 */
		public static double frequencyOf(double nominalVolts) {
			return nominalVolts <= 150 ? 60 : 50;
		}
	}

	/** A combination-wave surge: open-circuit peak and the generator's source impedance. */
	public record SurgeLevel(double peakVolts, double sourceOhms) {
	}

	/** The fraction of a rating a part may use, and where that fraction comes from. */
	public record Derating(double factor, String source) {
		public static final Derating NONE = new Derating(1.0, "no derating");
	}

	/** The derating table's key of one rating of one kind. */
	public static RatingKey key(PartKind kind, String rating) {
		return new RatingKey(kind, rating);
	}

	/** One rating of one kind of part, as the derating table is keyed. */
	public record RatingKey(PartKind kind, String rating) {
	}

	/** The derating of one rating of one kind; {@link Derating#NONE} when the policy sets none. */
	public Derating derating(PartKind kind, String rating) {
		return derating.getOrDefault(key(kind, rating), Derating.NONE);
	}

	/** The rule's severity under this policy. */
	public Severity severity(RuleId rule, Severity standard) {
		return severities.getOrDefault(rule, standard);
	}
}
