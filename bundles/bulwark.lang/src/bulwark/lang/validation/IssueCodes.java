package bulwark.lang.validation;

/** Codes of the language's own issues, shared by the validator, quick fixes and tests. */
public final class IssueCodes {
	private static final String PREFIX = "bulwark.lang.";

	/** A syntax error; the message says which. */
	public static final String SYNTAX = PREFIX + "syntax";
	/** A name that nothing of that sort in scope has. */
	public static final String UNKNOWN_NAME = PREFIX + "unknownName";
	public static final String UNKNOWN_UNIT = PREFIX + "unknownUnit";
	public static final String WRONG_UNIT = PREFIX + "wrongUnit";
	public static final String MISSING_UNIT = PREFIX + "missingUnit";
	public static final String UNEXPECTED_UNIT = PREFIX + "unexpectedUnit";
	public static final String UNKNOWN_WORD = PREFIX + "unknownWord";
	public static final String VALUE_OUT_OF_RANGE = PREFIX + "valueOutOfRange";
	public static final String UNKNOWN_PIN = PREFIX + "unknownPin";
	public static final String MISSING_PIN = PREFIX + "missingPin";
	public static final String DUPLICATE_PIN = PREFIX + "duplicatePin";
	public static final String UNKNOWN_PARAMETER = PREFIX + "unknownParameter";
	public static final String MISSING_PARAMETER = PREFIX + "missingParameter";
	public static final String UNKNOWN_RATING = PREFIX + "unknownRating";
	public static final String DUPLICATE_SETTING = PREFIX + "duplicateSetting";
	public static final String DUPLICATE_NAME = PREFIX + "duplicateName";
	public static final String NO_REFERENCE_NET = PREFIX + "noReferenceNet";
	public static final String MANY_REFERENCE_NETS = PREFIX + "manyReferenceNets";
	public static final String TOLERANCE_OUT_OF_RANGE = PREFIX + "toleranceOutOfRange";
	public static final String UNUSED_NET = PREFIX + "unusedNet";
	public static final String SAME_TERMINAL = PREFIX + "sameTerminal";
	public static final String WAIVER_INCOMPLETE = PREFIX + "waiverIncomplete";
	public static final String SINGLE_CONNECTION = PREFIX + "singleConnection";
	public static final String UNKNOWN_REQUIREMENT = PREFIX + "unknownRequirement";
	public static final String DUPLICATE_REQUIREMENT = PREFIX + "duplicateRequirement";
	public static final String LIBRARY_NOT_FOUND = PREFIX + "libraryNotFound";
	public static final String LIBRARY_OUTSIDE = PREFIX + "libraryOutside";
	public static final String LIBRARY_INVALID = PREFIX + "libraryInvalid";
	public static final String LIBRARY_CYCLE = PREFIX + "libraryCycle";
	public static final String DEFINITION_KIND = PREFIX + "definitionKind";
	public static final String KEYWORD_AS_NAME = PREFIX + "keywordAsName";
	public static final String SELF_CONNECTED = PREFIX + "selfConnected";

	private IssueCodes() {
	}
}
