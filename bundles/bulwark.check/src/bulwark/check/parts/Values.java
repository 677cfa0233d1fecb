package bulwark.check.parts;

import java.util.Optional;

import bulwark.lang.design.Part;

/**
 * Where the compiler takes a part's parameter values from: as written ({@link #WRITTEN}), or varied within
 * their tolerances for a tolerance analysis (Variation). Ratings are never varied.
 */
@FunctionalInterface
public interface Values {
	Values WRITTEN = Settings::parameter;

	Optional<Double> parameter(Part part, String name);
}
