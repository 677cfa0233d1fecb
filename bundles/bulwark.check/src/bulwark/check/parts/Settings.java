package bulwark.check.parts;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import bulwark.lang.design.Parameter;
import bulwark.lang.design.Part;
import bulwark.lang.design.Rating;
import bulwark.lang.design.Setting;
import bulwark.lang.units.Quantities;

/**
 * Reads a part's parameters and ratings as SI values: its own settings first, then those of the definition
 * it is made from ({@code is CHIP_1206}), so that a part overrides what its definition says.
 */
public final class Settings {
	private Settings() {
	}

	/** The part's own settings, then its definition's. */
	public static List<Setting> all(Part part) {
		if (part.getBase() == null || part.getBase().eIsProxy()) {
			return part.getSettings();
		}
		List<Setting> all = new ArrayList<>(part.getSettings());
		all.addAll(part.getBase().getSettings());
		return all;
	}

	public static Optional<Double> parameter(Part part, String name) {
		for (Setting s : all(part)) {
			if (s instanceof Parameter && name.equals(s.getName())) {
				return Quantities.si(s.getValue());
			}
		}
		return Optional.empty();
	}

	/** A parameter given as a word (colour red) or as a listed number (package 1206), as written. */
	public static Optional<String> wordOrNumber(Part part, String name) {
		for (Setting s : all(part)) {
			if (s instanceof Parameter p && name.equals(s.getName())) {
				return Optional.ofNullable(p.getWord() != null ? p.getWord()
						: p.getValue() == null ? null : p.getValue().getMagnitude());
			}
		}
		return Optional.empty();
	}

	/** A parameter given as a word (colour red). */
	public static Optional<String> word(Part part, String name) {
		for (Setting s : all(part)) {
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
		for (Setting s : all(part)) {
			if (s instanceof Rating r && name.equals(s.getName())) {
				return Optional.of(r);
			}
		}
		return Optional.empty();
	}
}
