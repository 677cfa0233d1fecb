package bulwark.cli;

import com.google.inject.Injector;

import bulwark.check.DesignChecker;
import bulwark.check.load.DesignLoader;
import bulwark.check.policy.ReviewPolicy;
import bulwark.lang.BulwarkStandaloneSetup;

/** The language runtime, set up once per run (building the injector is most of the start-up time). */
final class Language {
	private static Injector injector;

	private Language() {
	}

	static synchronized DesignLoader loader() {
		if (injector == null) {
			injector = new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration();
		}
		return new DesignLoader(injector);
	}

	static DesignChecker checker() {
		return new DesignChecker(loader());
	}

	/** A checker that applies the given review policy to every design. */
	static DesignChecker checker(ReviewPolicy policy) {
		return new DesignChecker(loader(), policy);
	}

	/** A checker with a review policy for every design (null: each design's own) and a time budget per design. */
	static DesignChecker checker(ReviewPolicy policy, java.time.Duration budget) {
		return new DesignChecker(loader(), policy, budget);
	}
}
