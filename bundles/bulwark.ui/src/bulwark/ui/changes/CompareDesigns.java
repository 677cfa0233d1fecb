package bulwark.ui.changes;

import java.io.IOException;
import java.nio.file.Path;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.handlers.HandlerUtil;

/** File > Compare Two Designs…: the older file, then the newer one; the Changes view shows what moved. */
public class CompareDesigns extends AbstractHandler {

	@Override
	public Object execute(ExecutionEvent event) throws ExecutionException {
		Shell shell = HandlerUtil.getActiveShellChecked(event);
		Path before = pick(shell, "Compare: the older design");
		Path after = before == null ? null : pick(shell, "Compare " + before.getFileName() + " with: the newer design");
		if (after == null) {
			return null;
		}
		try {
			ChangesView view = (ChangesView) HandlerUtil.getActiveWorkbenchWindowChecked(event).getActivePage()
					.showView(ChangesView.ID);
			view.compareFiles(before, after);
		} catch (IOException e) {
			MessageDialog.openError(shell, "Designs not compared", "Could not read a design: " + e.getMessage());
		} catch (org.eclipse.ui.PartInitException e) {
			throw new ExecutionException("cannot show the Changes view", e);
		}
		return null;
	}

	private static Path pick(Shell shell, String title) {
		FileDialog dialog = new FileDialog(shell, SWT.OPEN);
		dialog.setText(title);
		dialog.setFilterExtensions(new String[] { "*.bulwark;*.bulwark.bak", "*.*" });
		String file = dialog.open();
		return file == null ? null : Path.of(file);
	}
}
