package bulwark.lang.kinds;

import bulwark.lang.units.Unit;

import java.util.List;

/**
 * A parameter or rating a part kind accepts: its name, its unit (null for a plain number such as a current
 * gain), whether the design must give it, and for a parameter that is a word, the words it may be.
 */
public record SettingSpec(String name, Unit unit, boolean required, String meaning, List<String> choices) {

	public SettingSpec(String name, Unit unit, boolean required, String meaning) {
		this(name, unit, required, meaning, List.of());
	}

	/** A parameter whose value is one of a few words. */
	public static SettingSpec word(String name, String meaning, List<String> choices) {
		return new SettingSpec(name, null, false, meaning, List.copyOf(choices));
	}

	public boolean isWord() {
		return !choices.isEmpty();
	}
}
