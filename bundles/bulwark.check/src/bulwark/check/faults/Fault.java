package bulwark.check.faults;

/** One part failed one way. */
public record Fault(String part, FailureMode mode) {
	/** "R1 short", "Q1 collector–emitter short". */
	public String describe() {
		return part + " " + mode.words();
	}
}
