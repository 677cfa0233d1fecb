package bulwark.ui.help;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.core.filesystem.EFS;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;
import org.eclipse.ui.ide.FileStoreEditorInput;

/**
 * Help > a page of the documentation, read-only in a text editor: the command's id names the page
 * (bulwark.ui.help.user-guide → docs/user-guide.md under the installation).
 */
public class OpenGuide extends AbstractHandler {
	static final String PREFIX = "bulwark.ui.help.";

	@Override
	public Object execute(ExecutionEvent event) throws ExecutionException {
		String page = event.getCommand().getId().substring(PREFIX.length());
		Path file = bulwark.ui.BulwarkUi.installation().guidePage(page);
		var window = HandlerUtil.getActiveWorkbenchWindowChecked(event);
		if (!Files.isRegularFile(file)) {
			MessageDialog.openInformation(window.getShell(), "Bulwark help",
					"The documentation is in the docs folder of the Bulwark installation; " + file + " was not found.\n\n"
							+ bulwark.check.report.Caution.TEXT);
			return null;
		}
		try {
			window.getActivePage().openEditor(
					new FileStoreEditorInput(EFS.getLocalFileSystem().getStore(file.toUri())), "org.eclipse.ui.DefaultTextEditor");
		} catch (PartInitException e) {
			throw new ExecutionException("cannot open " + file, e);
		}
		return null;
	}
}
