package bulwark.check.rules;

import java.util.function.Consumer;

import bulwark.check.cases.SolvedCase;
import bulwark.check.finding.Finding;

/**
 * One rule's part of one design's check. Cases come one at a time and, for the mains and surge cases, from
 * several threads in turn (never two at once) and in no set order: {@code order} gives each its place in
 * the check's order, so that a tie goes to the earlier case, the same on every run.
 */
public interface RuleReading {
	/** A case that solved; what is not kept of it now is gone, for the checker lets every case go. */
	default void read(long order, SolvedCase c) {
	}

	/** The findings, once every case has been read. */
	void findings(Consumer<Finding> findings);
}
