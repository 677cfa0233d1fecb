package bulwark.ui;

import bulwark.check.DesignChecker;
import bulwark.check.load.DesignLoader;
import bulwark.lang.ide.BulwarkIdeSetup;

/** The workbench's one language injector and checker, created on first use (the injector takes a second). */
public final class BulwarkUi {
	private static volatile DesignChecker checker;

	private BulwarkUi() {
	}

	/**
	 * From now on, checks every design under this review policy file, whatever the designs name (the
	 * workbench's --policy); a policy with errors is refused with them, and the checker stays as it was.
	 */
	public static java.util.List<bulwark.check.Finding> usePolicy(java.nio.file.Path file) {
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
					c = new DesignChecker(new DesignLoader(new BulwarkIdeSetup().createInjectorAndDoEMFRegistration()));
					checker = c;
				}
			}
		}
		return c;
	}
}
