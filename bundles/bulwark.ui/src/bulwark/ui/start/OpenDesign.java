package bulwark.ui.start;

import java.nio.file.Path;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.ui.handlers.HandlerUtil;

import bulwark.ui.Application;

/** File > Open…: designs and review policies, several at once. */
public class OpenDesign extends AbstractHandler {

	@Override
	public Object execute(ExecutionEvent event) throws ExecutionException {
		FileDialog dialog = new FileDialog(HandlerUtil.getActiveShellChecked(event), SWT.OPEN | SWT.MULTI);
		dialog.setText("Open design or review policy");
		dialog.setFilterExtensions(new String[] { "*.bulwark;*.bulwark-policy", "*.*" });
		dialog.setFilterNames(new String[] { "Designs and review policies", "All files" });
		if (dialog.open() == null) {
			return null;
		}
		var page = HandlerUtil.getActiveWorkbenchWindowChecked(event).getActivePage();
		for (String name : dialog.getFileNames()) {
			Application.openFile(page, Path.of(dialog.getFilterPath(), name));
		}
		return null;
	}
}
