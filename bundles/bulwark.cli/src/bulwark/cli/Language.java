package bulwark.cli;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

import com.google.inject.Injector;

import bulwark.check.budget.Budget;
import bulwark.check.DesignChecker;
import bulwark.check.load.DesignLoader;
import bulwark.check.policy.ReviewPolicy;
import bulwark.lang.BulwarkStandaloneSetup;
import bulwark.lang.install.Installation;

/**
 * The language runtime, set up once per run (building the injector is most of the start-up time), and the
 * installation the launcher describes, read once here and handed to everything below.
 */
final class Language {
	private static final Installation INSTALLATION = Installation.fromLaunch();
	private static Injector injector;

	private Language() {
	}

	/** The installation of this run: documents, demo designs, the library path of the environment. */
	static Installation installation() {
		return INSTALLATION;
	}

	private static synchronized Injector injector() {
		if (injector == null) {
			injector = new BulwarkStandaloneSetup().createInjectorAndDoEMFRegistration();
		}
		return injector;
	}

	/** A checker under each design's own policy. */
	static DesignChecker checker() {
		return checker(null, Budget.DEFAULT, List.of());
	}

	/** A checker that applies the given review policy to every design. */
	static DesignChecker checker(ReviewPolicy policy) {
		return checker(policy, Budget.DEFAULT, List.of());
	}

	/**
	 * A checker with a review policy for every design (null: each design's own), a time budget per design, and
	 * library folders searched before those of the installation (a run's --library).
	 */
	static DesignChecker checker(ReviewPolicy policy, Duration budget, List<Path> libraryFolders) {
		DesignLoader loader = new DesignLoader(injector(), INSTALLATION.withLibraryFoldersFirst(libraryFolders));
		return new DesignChecker(loader, policy, budget);
	}
}
