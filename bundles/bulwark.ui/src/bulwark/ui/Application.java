package bulwark.ui;

import java.nio.file.Path;

import org.eclipse.core.filesystem.EFS;
import org.eclipse.core.filesystem.IFileStore;
import org.eclipse.core.runtime.Platform;
import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.application.IWorkbenchConfigurer;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchAdvisor;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;
import org.eclipse.ui.ide.FileStoreEditorInput;

import bulwark.ui.editor.DesignEditor;

/**
 * The workbench application. Design files named on the command line open in the design editor;
 * {@code --snapshot FILE} saves a picture and the marked findings once the first design is checked, then exits.
 */
public class Application implements IApplication {

	@Override
	public Object start(IApplicationContext context) {
		Display display = PlatformUI.createDisplay();
		try {
			int rc = PlatformUI.createAndRunWorkbench(display, new WorkbenchAdvisor() {
				@Override
				public String getInitialWindowPerspectiveId() {
					return ReviewPerspective.ID;
				}

				@Override
				public void initialize(IWorkbenchConfigurer configurer) {
					configurer.setSaveAndRestore(false);
				}

				@Override
				public WorkbenchWindowAdvisor createWorkbenchWindowAdvisor(IWorkbenchWindowConfigurer c) {
					return new WorkbenchWindowAdvisor(c) {
						@Override
						public org.eclipse.ui.application.ActionBarAdvisor createActionBarAdvisor(
								org.eclipse.ui.application.IActionBarConfigurer bars) {
							return new org.eclipse.ui.application.ActionBarAdvisor(bars) {
								@Override
								protected void fillStatusLine(org.eclipse.jface.action.IStatusLineManager line) {
									// the caution is always in sight, whatever is open: an item of its own, which
									// no part's status message replaces; the whole text is its tooltip
									var caution = new org.eclipse.ui.texteditor.StatusLineContributionItem(
											"bulwark.ui.caution", true, bulwark.check.report.Caution.SHORT.length() + 2);
									caution.setText(bulwark.check.report.Caution.SHORT);
									caution.setToolTipText(bulwark.check.report.Caution.TEXT);
									line.add(caution);
								}
							};
						}

						@Override
						public void preWindowOpen() {
							c.setInitialSize(new Point(1200, 760));
							c.setShowStatusLine(true);
							c.setShowProgressIndicator(true); // background jobs such as a tolerance run
							c.setTitle("Bulwark");
						}

						@Override
						public void postWindowOpen() {
							String[] args = Platform.getApplicationArgs();
							DesignEditor first = null;
							Path snapshot = null;
							for (int i = 0; i < args.length; i++) {
								if ("--snapshot".equals(args[i]) && i + 1 < args.length) {
									snapshot = Path.of(args[++i]);
								} else if ("--policy".equals(args[i]) && i + 1 < args.length) {
									var problems = BulwarkUi.usePolicy(Path.of(args[++i]));
									if (!problems.isEmpty()) {
										org.eclipse.jface.dialogs.MessageDialog.openError(c.getWindow().getShell(),
												"Review policy not used", problems.stream().map(f -> f.message())
														.collect(java.util.stream.Collectors.joining("\n")));
									}
								} else if (args[i].endsWith(".bulwark")) {
									DesignEditor editor = openFile(c.getWindow().getActivePage(), Path.of(args[i]));
									first = first == null ? editor : first;
								}
							}
							if (first == null && snapshot == null) {
								try {
									c.getWindow().getActivePage().showView(bulwark.ui.start.StartView.ID);
								} catch (PartInitException e) {
									throw new IllegalStateException(e);
								}
							}
							if (snapshot != null) {
								Snapshot.whenChecked(c.getWindow(), first, snapshot);
							}
						}
					};
				}
			});
			return rc == PlatformUI.RETURN_RESTART ? IApplication.EXIT_RESTART : IApplication.EXIT_OK;
		} finally {
			display.dispose();
		}
	}

	/** Opens a design file from anywhere on disk (no workspace project needed). */
	public static DesignEditor openFile(IWorkbenchPage page, Path file) {
		try {
			IFileStore store = EFS.getLocalFileSystem().getStore(file.toAbsolutePath().toUri());
			return (DesignEditor) page.openEditor(new FileStoreEditorInput(store), DesignEditor.ID);
		} catch (PartInitException e) {
			throw new IllegalStateException("cannot open " + file, e);
		}
	}

	@Override
	public void stop() {
		if (!PlatformUI.isWorkbenchRunning()) {
			return;
		}
		IWorkbench workbench = PlatformUI.getWorkbench();
		Display display = workbench.getDisplay();
		display.syncExec(() -> {
			if (!display.isDisposed()) {
				workbench.close();
			}
		});
	}
}
