package bulwark.check.stress;

import java.util.Optional;

import bulwark.check.parts.ResistorRatings;
import bulwark.check.parts.Settings;
import bulwark.check.policy.ReviewPolicy;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * A part's limit for one stress: its written rating, or a default the trade assumes where the design is
 * silent (each with its source), derated by the review policy. Empty when there is nothing to compare with;
 * rating-missing reports the ratings a rule needs.
 */
public final class Limits {
	/** Assumed reverse base–emitter rating [common practice, docs/sources.md#semiconductor-inputs: VEBO ≈ 5–6 V]. */
	public static final double ASSUMED_EMITTER_BASE = 5;
	/** Assumed margin of a comparator input beyond its rails [common practice, docs/sources.md#semiconductor-inputs: 0.3 V]. */
	public static final double ASSUMED_INPUT_MARGIN = 0.3;
	/** Assumed input clamp current rating [common practice, docs/sources.md#semiconductor-inputs: 10 mA]. */
	public static final double ASSUMED_CLAMP = 10e-3;
	/**
	 * Assumed charging current a primary cell tolerates [unconfirmed: primary-cell safety guidance asks for charging
	 * to be prevented; a blocking diode's leakage, microamperes, is what designs then let through].
	 */
	public static final double ASSUMED_PRIMARY_CHARGE = 10e-6;

	private Limits() {
	}

	public static Optional<Limit> of(Part part, Measure measure, ReviewPolicy policy) {
		return rated(part, measure).map(r -> {
			ReviewPolicy.Derating d = policy.derating(part.getKind(), measure.rating());
			return new Limit(r.value, measure.unit(), r.basis, d.factor(), d.source());
		});
	}

	private record Rated(double value, String basis) {
	}

	/**
	 * A part's ratings as read once: every case of a check asks for them again, and reading one parses its
	 * quantity. Kept on the part itself, which lives as long as one check of its design.
	 */
	private static final class RatedCache extends org.eclipse.emf.common.notify.impl.AdapterImpl {
		final java.util.Map<String, Optional<Rated>> byRating = new java.util.HashMap<>();

		@Override
		public boolean isAdapterForType(Object type) {
			return type == RatedCache.class;
		}
	}

	private static Optional<Rated> rated(Part part, Measure measure) {
		RatedCache cache = (RatedCache) org.eclipse.emf.ecore.util.EcoreUtil.getAdapter(part.eAdapters(), RatedCache.class);
		if (cache == null) {
			cache = new RatedCache();
			part.eAdapters().add(cache);
		}
		return cache.byRating.computeIfAbsent(measure.rating(), r -> read(part, measure));
	}

	private static Optional<Rated> read(Part part, Measure measure) {
		String rating = measure.rating();
		if (part.getKind() == PartKind.RESISTOR && rating.equals("voltage")) {
			return ResistorRatings.limitingElementVoltage(part).map(v -> new Rated(v.value(), v.basis()));
		}
		if (part.getKind() == PartKind.RESISTOR && rating.equals("power")) {
			return ResistorRatings.power(part).map(v -> new Rated(v.value(), v.basis()));
		}
		Optional<Rated> written = Settings.rating(part, rating).map(v -> new Rated(v, "its rated"));
		if (written.isPresent()) {
			return written;
		}
		return switch (rating) {
		case "emitter_base" -> Optional.of(new Rated(ASSUMED_EMITTER_BASE, "the assumed small-signal"));
		case "input_margin" -> Optional.of(new Rated(ASSUMED_INPUT_MARGIN, "the assumed CMOS"));
		case "clamp" -> Optional.of(new Rated(ASSUMED_CLAMP, "the assumed"));
		case "charge" -> primary(part) ? Optional.of(new Rated(ASSUMED_PRIMARY_CHARGE, "the assumed primary-cell"))
				: Optional.empty();
		default -> Optional.empty();
		};
	}

	/** A battery is a primary cell unless the design says it is rechargeable. */
	public static boolean primary(Part part) {
		return part.getKind() == PartKind.BATTERY && !"rechargeable".equals(Settings.word(part, "type").orElse("primary"));
	}
}
