package bulwark.lang.kinds;

import java.util.List;
import java.util.Optional;

/** What one part kind has: named pins, parameters and ratings. */
public record KindSpec(String kind, List<String> pins, List<SettingSpec> parameters, List<SettingSpec> ratings) {

	public Optional<SettingSpec> parameter(String name) {
		return parameters.stream().filter(p -> p.name().equals(name)).findFirst();
	}

	public Optional<SettingSpec> rating(String name) {
		return ratings.stream().filter(p -> p.name().equals(name)).findFirst();
	}
}
