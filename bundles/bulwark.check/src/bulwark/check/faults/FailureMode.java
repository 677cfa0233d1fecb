package bulwark.check.faults;

/** How one part fails in single fault condition: open, shorted, or shorted between two of its pins. */
public enum FailureMode {
	OPEN("open"), SHORT("short"), COLLECTOR_EMITTER_SHORT("collector–emitter short"),
	BASE_EMITTER_SHORT("base–emitter short"), DRAIN_SOURCE_SHORT("drain–source short"),
	GATE_SOURCE_SHORT("gate–source short"), OUTPUT_HIGH("output stuck high"), OUTPUT_LOW("output stuck low"),
	WIPER_OPEN("wiper open");

	private final String words;

	FailureMode(String words) {
		this.words = words;
	}

	/** As messages write it: "short", "collector–emitter short". */
	public String words() {
		return words;
	}
}
