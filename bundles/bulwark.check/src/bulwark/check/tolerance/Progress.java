package bulwark.check.tolerance;

/** Reports how far a long analysis has come, and lets its caller stop it. */
public interface Progress {
	Progress NONE = new Progress() {
		@Override
		public void done(int finished, int total) {
		}

		@Override
		public boolean cancelled() {
			return false;
		}
	};

	/** Called after each evaluation, from any thread. */
	void done(int finished, int total);

	/** Polled before each evaluation; once true, no more are started. */
	boolean cancelled();
}
