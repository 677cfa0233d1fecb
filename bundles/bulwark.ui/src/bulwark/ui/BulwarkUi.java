package bulwark.ui;

import bulwark.check.DesignChecker;
import bulwark.check.load.DesignLoader;
import bulwark.lang.ide.BulwarkIdeSetup;
import bulwark.lang.install.Installation;

/** The workbench's one language injector and checker, created on first use (the injector takes a second). */
public final class BulwarkUi {
	/** The installation the workbench was launched from, read once. */
	private static final Installation INSTALLATION = Installation.fromLaunch();
	private static volatile DesignChecker checker;

	private BulwarkUi() {
	}

	/** Where the workbench's documents and demo designs are, and its library folders. */
	public static Installation installation() {
		return INSTALLATION;
	}

	/**
	 * From now on, checks every design under this review policy file, whatever the designs name (the
	 * workbench's --policy); a policy with errors is refused with them, and the checker stays as it was.
	 */
	public static java.util.List<bulwark.check.finding.Finding> usePolicy(java.nio.file.Path file) {
		DesignChecker base = checker();
		bulwark.check.policy.PolicyFiles.Resolution r = base.policies().read(file);
		if (r.policy().isEmpty()) {
			return r.problems();
		}
		synchronized (BulwarkUi.class) {
			checker = new DesignChecker(base.loader(), r.policy().get());
		}
		return java.util.List.of();
	}

	public static DesignChecker checker() {
		DesignChecker c = checker;
		if (c == null) {
			synchronized (BulwarkUi.class) {
				c = checker;
				if (c == null) {
					c = new DesignChecker(new DesignLoader(new BulwarkIdeSetup().createInjectorAndDoEMFRegistration(), INSTALLATION));
					checker = c;
				}
			}
		}
		return c;
	}
}
