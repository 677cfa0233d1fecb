package bulwark.lang.kinds;

import bulwark.lang.units.Unit;

/** A parameter or rating a part kind accepts: its name, its unit, and whether the design must give it. */
public record SettingSpec(String name, Unit unit, boolean required, String meaning) {
}
