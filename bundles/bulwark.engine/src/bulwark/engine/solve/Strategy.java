package bulwark.engine.solve;

/** Which way the operating point was reached; reported so that a hard-won solution can be looked at twice. */
public enum Strategy {
	/** Plain Newton–Raphson from the starting point. */
	NEWTON,
	/** A conductance to the reference from every net, stepped down to zero. */
	GMIN_STEPPING,
	/** Every independent source ramped up from zero. */
	SOURCE_STEPPING
}
