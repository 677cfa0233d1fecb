package bulwark.check.budget;

import java.time.Duration;
import java.util.Locale;

/**
 * The time a check of one design may take. The check passes checkpoints (between cases, terminal pairs,
 * rules); past the deadline the next one throws {@link OverBudget}, and the design is reported as not
 * checked — the batch goes on. Held per thread, so parallel checks each have their own; the threads one
 * check shares its cases with run {@link #within} its budget.
 */
public final class Budget {
	/** The default budget per design [common practice: far beyond any input stage's check, which takes milliseconds]. */
	public static final Duration DEFAULT = Duration.ofSeconds(60);
	private static final ThreadLocal<Budget> CURRENT = new ThreadLocal<>();

	private final long deadline;
	private final Duration limit;

	private Budget(Duration limit) {
		this.limit = limit;
		this.deadline = System.nanoTime() + limit.toNanos();
	}

	/** Thrown at the first checkpoint past the deadline. */
	public static final class OverBudget extends RuntimeException {
		private static final long serialVersionUID = 1L;

		OverBudget(Duration limit, String where) {
			super(String.format(Locale.ROOT, "the check took longer than its budget of %.3g s (stopped at %s)",
					limit.toMillis() / 1000.0, where), null, false, false);
		}
	}

	public static void start(Duration limit) {
		CURRENT.set(new Budget(limit));
	}

	public static void stop() {
		CURRENT.remove();
	}

	/** The running check's budget on this thread, to hand to the threads that share its work (null outside a check). */
	public static Budget current() {
		return CURRENT.get();
	}

	/** Runs part of a check on this thread under the check's budget (none when {@code budget} is null). */
	public static void within(Budget budget, Runnable work) {
		Budget mine = CURRENT.get();
		if (budget == null) {
			CURRENT.remove();
		} else {
			CURRENT.set(budget);
		}
		try {
			work.run();
		} finally {
			if (mine == null) {
				CURRENT.remove();
			} else {
				CURRENT.set(mine);
			}
		}
	}

	/** Whether the running check on this thread is past its deadline (never outside a check). */
	public static boolean overdue() {
		Budget b = CURRENT.get();
		return b != null && System.nanoTime() > b.deadline;
	}

	/** Throws {@link OverBudget} when the running check is past its deadline; nothing outside a check. */
	public static void checkpoint(String where) {
		Budget b = CURRENT.get();
		if (b != null && System.nanoTime() > b.deadline) {
			throw new OverBudget(b.limit, where);
		}
	}
}
