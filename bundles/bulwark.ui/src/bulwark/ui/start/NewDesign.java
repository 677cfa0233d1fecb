package bulwark.ui.start;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.handlers.HandlerUtil;

import bulwark.check.io.AtomicFile;
import bulwark.ui.Application;
import bulwark.ui.editor.DesignEditor;

/** File > New Design…: pick a template, name the file, and it opens in the editor. */
public class NewDesign extends AbstractHandler {

	@Override
	public Object execute(ExecutionEvent event) throws ExecutionException {
		Shell shell = HandlerUtil.getActiveShellChecked(event);
		TemplateDialog choose = new TemplateDialog(shell);
		if (choose.open() != org.eclipse.jface.window.Window.OK || choose.chosen() == null) {
			return null;
		}
		askAndCreate(shell, HandlerUtil.getActiveWorkbenchWindowChecked(event).getActivePage(), choose.chosen());
		return null;
	}

	/** Asks where to put a new design from a template, then writes and opens it. */
	public static void askAndCreate(Shell shell, IWorkbenchPage page, Templates.Template template) {
		FileDialog where = new FileDialog(shell, SWT.SAVE);
		where.setText("New design from \u201c" + template.name() + "\u201d");
		where.setFilterExtensions(new String[] { "*.bulwark" });
		where.setFileName(template.file());
		where.setOverwrite(true);
		String file = where.open();
		if (file == null) {
			return;
		}
		Path path = Path.of(file.endsWith(".bulwark") ? file : file + ".bulwark");
		try {
			create(page, template, path);
		} catch (IOException e) {
			MessageDialog.openError(shell, "Design not created", "Could not write " + path + ": " + e.getMessage());
		}
	}

	/**
	 * Writes a template to a file and opens it. An existing file is kept as NAME.bak (the dialog asked before
	 * overwriting); the write is atomic.
	 */
	public static DesignEditor create(IWorkbenchPage page, Templates.Template template, Path file) throws IOException {
		AtomicFile.write(file, template.text(), Files.exists(file));
		return Application.openFile(page, file);
	}
}
