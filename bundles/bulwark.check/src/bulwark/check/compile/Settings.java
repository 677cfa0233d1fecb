package bulwark.check.compile;

import java.util.Optional;

import bulwark.lang.design.Parameter;
import bulwark.lang.design.Part;
import bulwark.lang.design.Rating;
import bulwark.lang.design.Setting;
import bulwark.lang.units.Quantities;

/** Reads a part's parameters and ratings as SI values. */
public final class Settings {
	private Settings() {
	}

	public static Optional<Double> parameter(Part part, String name) {
		for (Setting s : part.getSettings()) {
			if (s instanceof Parameter && name.equals(s.getName())) {
				return Quantities.si(s.getValue());
			}
		}
		return Optional.empty();
	}

	/** A parameter given as a word (colour red) or as a listed number (package 1206), as written. */
	public static Optional<String> wordOrNumber(Part part, String name) {
		for (Setting s : part.getSettings()) {
			if (s instanceof Parameter p && name.equals(s.getName())) {
				return Optional.ofNullable(p.getWord() != null ? p.getWord()
						: p.getValue() == null ? null : p.getValue().getMagnitude());
			}
		}
		return Optional.empty();
	}

	/** A parameter given as a word (colour red). */
	public static Optional<String> word(Part part, String name) {
		for (Setting s : part.getSettings()) {
			if (s instanceof Parameter p && name.equals(s.getName()) && p.getWord() != null) {
				return Optional.of(p.getWord());
			}
		}
		return Optional.empty();
	}

	public static Optional<Double> rating(Part part, String name) {
		return ratingSetting(part, name).flatMap(r -> Quantities.si(r.getValue()));
	}

	public static Optional<Rating> ratingSetting(Part part, String name) {
		for (Setting s : part.getSettings()) {
			if (s instanceof Rating r && name.equals(s.getName())) {
				return Optional.of(r);
			}
		}
		return Optional.empty();
	}
}
