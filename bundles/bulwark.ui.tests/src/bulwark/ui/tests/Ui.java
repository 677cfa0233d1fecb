package bulwark.ui.tests;

import java.nio.file.Path;
import java.util.function.BooleanSupplier;

import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;

/** What the UI tests share: the repository, the active page, and waiting while the UI runs. */
final class Ui {
	static final Path ROOT = Path.of(System.getProperty("bulwark.root", "../..")).toAbsolutePath().normalize();

	private Ui() {
	}

	static IWorkbenchPage page() {
		return PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
	}

	/** Runs the event loop (and so the background checks' results) until the condition holds, at most a minute. */
	static boolean waitUntil(BooleanSupplier condition) {
		Display display = Display.getCurrent();
		long deadline = System.currentTimeMillis() + 60_000;
		while (System.currentTimeMillis() < deadline) {
			if (condition.getAsBoolean()) {
				return true;
			}
			while (display.readAndDispatch()) {
				// keep the UI and the background checks going
			}
			display.timerExec(50, () -> {
			});
			display.sleep();
		}
		return condition.getAsBoolean();
	}
}
