package bulwark.check.compile;

import java.util.Map;
import java.util.Optional;

import bulwark.lang.design.Part;
import bulwark.check.parts.Settings;
import bulwark.check.parts.Values;

/** Parameter values scaled by factors, each keyed "PART.parameter": one corner or one Monte Carlo sample. */
public record Variation(Map<String, Double> factors) implements Values {
	public Variation {
		factors = Map.copyOf(factors);
	}

	public static String key(String part, String parameter) {
		return part + "." + parameter;
	}

	@Override
	public Optional<Double> parameter(Part part, String name) {
		Double factor = factors.get(key(part.getName(), name));
		return Settings.parameter(part, name).map(v -> factor == null ? v : v * factor);
	}
}
