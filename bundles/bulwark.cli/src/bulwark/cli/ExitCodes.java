package bulwark.cli;

/** The command line's exit codes, a contract for CI scripts. */
public final class ExitCodes {
	/** Every design checked, no error finding. */
	public static final int CLEAN = 0;
	/** At least one error finding. */
	public static final int FINDINGS = 1;
	/** At least one design could not be checked: syntax error, unreadable file, solver failure. */
	public static final int NOT_CHECKED = 2;
	/** The command line itself was wrong. */
	public static final int USAGE = 3;

	private ExitCodes() {
	}
}
