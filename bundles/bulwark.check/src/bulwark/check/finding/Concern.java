package bulwark.check.finding;

/** What a finding is about. The JSON names are a contract: add, never rename. */
public enum Concern {
	STRUCTURE("structure"), SYNTAX("syntax"), SOLVER("solver"), RATING_MISSING("rating-missing"), POWER("power"),
	SERIES_STRING("series-string"), REVERSE_VOLTAGE("reverse-voltage"), BASE_EMITTER("base-emitter"),
	COMPARATOR_INPUT("comparator-input"), CLAMP_CURRENT("clamp-current"), CAPACITOR_VOLTAGE("capacitor-voltage"),
	PROTECTOR("protector"), REVERSE_PATH("reverse-path"), HYSTERESIS("hysteresis"), REQUIREMENT("requirement"), VOLTAGE("voltage"), FORWARD_CURRENT("forward-current"),
	TRANSISTOR("transistor"), BATTERY("battery"), FUSE("fuse"), SINGLE_FAULT("single-fault"), CURRENT("current"),
	SUPPLY("supply");

	private final String id;

	Concern(String id) {
		this.id = id;
	}

	public String id() {
		return id;
	}
}
