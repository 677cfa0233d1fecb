package bulwark.ui;

import bulwark.check.DesignChecker;
import bulwark.check.load.DesignLoader;
import bulwark.lang.ide.BulwarkIdeSetup;

/** The workbench's one language injector and checker, created on first use (the injector takes a second). */
public final class BulwarkUi {
	private static volatile DesignChecker checker;

	private BulwarkUi() {
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
