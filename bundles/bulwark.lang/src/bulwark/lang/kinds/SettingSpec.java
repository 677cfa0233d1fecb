package bulwark.lang.kinds;

import bulwark.lang.units.Unit;

/**
 * A parameter or rating a part kind accepts: its name, its unit (null for a plain number such as a current
 * gain), and whether the design must give it.
 */
public record SettingSpec(String name, Unit unit, boolean required, String meaning) {
}
